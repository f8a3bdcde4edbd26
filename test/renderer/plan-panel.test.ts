/**
 * The plan editor in the Workspace: start a plan, add a door, move a laser's exit with the keyboard,
 * type coordinates, and see the finding the core gives. The beam (invented): 5 W CW at 532 nm, 2.3 mm,
 * 0.4 mrad (1/e²): its NOHD is far beyond the room (ICNIRP 2013 visible 0.25 s limit 25.4 W/m²,
 * derived), so a door across its path is inside the direct-beam zone.
 * Geometry (derived): the new plan is 6 m × 4 m; the laser's exit is at (1, 1.5), its beam dump at
 * (4.5, 1.5); the added door D2 is put on the north wall, and typed onto the beam line at x = 3 m.
 */
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import type { LaserInput, RoomPlan } from '../../core/index.js';
import PlanHarness from './PlanHarness.svelte';

const lasers: LaserInput[] = [
  { id: 'L1', name: 'Green laser', beams: [{ id: 'g', label: 'green 532 nm', wavelength_nm: 532, emission: { kind: 'cw', power_W: 5 }, beam: { diameter_m: 0.0023, divergence_rad: 0.0004, definition: '1/e2' } }] },
];
const plan = (): RoomPlan => JSON.parse(screen.getByTestId('plan-json').textContent ?? 'null') as RoomPlan;

describe('plan editor', () => {
  it('starts a plan, adds a door, types its place across the beam and shows the finding', async () => {
    render(PlanHarness, { lasers });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    expect(plan().paths[0]?.exit).toEqual({ x_m: 1, y_m: 1.5 });
    await fireEvent.click(screen.getByRole('button', { name: '+ Door' }));
    expect(plan().doors.map((d) => d.id)).toEqual(['D1', 'D2']);
    // A door across the bench: typed coordinates, one field at a time.
    for (const [label, value] of [
      ['Door D2, one side, x in metres', '3'],
      ['Door D2, one side, y in metres', '1'],
      ['Door D2, other side, x in metres', '3'],
      ['Door D2, other side, y in metres', '2'],
    ] as const) {
      const box = screen.getByLabelText(label);
      await fireEvent.input(box, { target: { value } });
      await fireEvent.change(box, { target: { value } });
    }
    expect(plan().doors[1]).toMatchObject({ a: { x_m: 3, y_m: 1 }, b: { x_m: 3, y_m: 2 } });
    const findings = screen.getByRole('region', { name: 'Findings from the plan' });
    expect(within(findings).getByText(/Door D2 is inside the direct-beam zone of green 532 nm\./)).toBeTruthy();
  });

  it('every point of a door, window, wall, curtain and barrier is named in the same words on its drawn handle and its typed fields (a door or window by its sides, the others by their ends)', async () => {
    render(PlanHarness, { lasers });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    for (const what of ['Window', 'Interior wall', 'Curtain', 'Barrier']) await fireEvent.click(screen.getByRole('button', { name: `+ ${what}` }));
    const drawing = screen.getByRole('group', { name: /Room plan, top view/ });
    const named = [...drawing.querySelectorAll('[role="button"][aria-label]')]
      .map((h) => /^(.*): x -?\d/.exec(h.getAttribute('aria-label') ?? '')?.[1] ?? '')
      .filter((n) => /^(Door|Window|Wall|Curtain|Barrier) /.test(n));
    expect(named).toEqual([
      'Door D1, one side',
      'Door D1, other side',
      'Window W1, one side',
      'Window W1, other side',
      'Wall IW1, one end',
      'Wall IW1, other end',
      'Curtain C1, one end',
      'Curtain C1, other end',
      'Barrier B1, one end',
      'Barrier B1, other end',
    ]);
    for (const n of named) for (const axis of ['x', 'y']) expect(screen.getByLabelText(`${n}, ${axis} in metres`)).toBeTruthy();
  });

  it('moves the laser exit with the arrow keys (0.1 m; with Shift 0.01 m) and keeps the new place', async () => {
    render(PlanHarness, { lasers });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    const handle = screen.getByRole('button', { name: /^Green laser, beam exit: x 1\.00 m, y 1\.50 m/ });
    await fireEvent.keyDown(handle, { key: 'ArrowRight' });
    await fireEvent.keyDown(screen.getByRole('button', { name: /^Green laser, beam exit: x 1\.10 m/ }), { key: 'ArrowUp', shiftKey: true });
    expect(plan().paths[0]?.exit).toEqual({ x_m: 1.1, y_m: 1.51 });
  });

  it('records the laser controlled area the officer accepts, by name', async () => {
    render(PlanHarness, { lasers });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    const accept = screen.getByRole('button', { name: 'Accept boundary' }) as HTMLButtonElement;
    expect(accept.disabled).toBe(true);
    await fireEvent.input(screen.getByLabelText('Accept the room as the laser controlled area, by'), { target: { value: 'I. Calloway-Senn' } });
    await fireEvent.click(accept);
    expect(plan().controlledArea).toEqual({ outline: plan().outline, acceptedBy: 'I. Calloway-Senn' });
    expect(screen.getByText(/Laser controlled area accepted by/)).toBeTruthy();
    // The officer's reason for the boundary is recorded with it (printed beside it in the report).
    const note = screen.getByLabelText('Note on the accepted boundary (optional)');
    await fireEvent.input(note, { target: { value: ' Both doors interlocked; corridor side signed. ' } });
    await fireEvent.change(note, { target: { value: ' Both doors interlocked; corridor side signed. ' } });
    expect(plan().controlledArea?.note).toBe('Both doors interlocked; corridor side signed.');
    await fireEvent.input(note, { target: { value: '' } });
    await fireEvent.change(note, { target: { value: '' } });
    expect(plan().controlledArea).toEqual({ outline: plan().outline, acceptedBy: 'I. Calloway-Senn' });
  });
});

describe('plan errors in officer words (never a field path on screen)', () => {
  it('a door typed with both sides at one point is named by its own name', async () => {
    const { evaluateRoom, InputError } = await import('../../core/index.js');
    const { newPlan, planErrorWords } = await import('../../renderer/lib/plan-edit.js');
    const base = newPlan([{ id: 'L1', name: 'Green laser' }]);
    const bad: RoomPlan = { ...base, doors: [...base.doors, { id: 'D2', label: 'D2 store', a: { x_m: 1, y_m: 4 }, b: { x_m: 1, y_m: 4 } }] };
    let words = '';
    try {
      evaluateRoom({ lasers, plan: bad });
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      words = planErrorWords(e.message, e.field, bad, [{ id: 'L1', name: 'Green laser' }]);
    }
    expect(words).toMatch(/^Door D2 store, other side: /);
    expect(words).not.toMatch(/plan\.|\[\d\]|_m\b/);
  });

  it('a curtain typed with both ends at one point is named as on its handle: by its kind and its ends', async () => {
    const { evaluateRoom, InputError } = await import('../../core/index.js');
    const { newPlan, planErrorWords } = await import('../../renderer/lib/plan-edit.js');
    const base = newPlan([{ id: 'L1', name: 'Green laser' }]);
    const bad: RoomPlan = { ...base, barriers: [{ id: 'C1', label: 'C1', kind: 'curtain', rating: '', a: { x_m: 2, y_m: 1 }, b: { x_m: 2, y_m: 1 } }] };
    let words = '';
    try {
      evaluateRoom({ lasers, plan: bad });
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      words = planErrorWords(e.message, e.field, bad, [{ id: 'L1', name: 'Green laser' }]);
    }
    expect(words).toMatch(/^Curtain C1, other end: /);
  });
});

describe('undo, redo and the corners of the room outline (keyboard first)', () => {
  it('a run of arrow keys on one corner is one step: Undo puts it back, Redo moves it again', async () => {
    render(PlanHarness, { lasers });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    const corner = () => screen.getByRole('button', { name: /^Room corner 3: / });
    await fireEvent.keyDown(corner(), { key: 'ArrowRight' });
    await fireEvent.keyDown(corner(), { key: 'ArrowRight' });
    expect(plan().outline[2]).toEqual({ x_m: 6.2, y_m: 4 });
    await fireEvent.click(screen.getByRole('button', { name: 'Undo: move Room corner 3' }));
    expect(plan().outline[2]).toEqual({ x_m: 6, y_m: 4 });
    await fireEvent.click(screen.getByRole('button', { name: 'Redo: move Room corner 3' }));
    expect(plan().outline[2]).toEqual({ x_m: 6.2, y_m: 4 });
  });

  it('Ctrl+Z and Ctrl+Y work from the drawing; undo goes back past the start of the plan', async () => {
    render(PlanHarness, { lasers });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    await fireEvent.click(screen.getByRole('button', { name: '+ Window' }));
    expect(plan().windows.map((w) => w.id)).toEqual(['W1']);
    const anyHandle = screen.getByRole('button', { name: /^Room corner 1: / });
    await fireEvent.keyDown(anyHandle, { key: 'z', ctrlKey: true });
    expect(plan().windows).toEqual([]);
    await fireEvent.keyDown(screen.getByRole('button', { name: /^Room corner 1: / }), { key: 'z', ctrlKey: true });
    expect(plan()).toBeNull();
    await fireEvent.keyDown(screen.getByRole('button', { name: 'Redo: start the room plan' }), { key: 'y', ctrlKey: true });
    expect(plan()?.outline).toHaveLength(4);
  });

  it('makes an L-shaped room: + on a side adds a corner, typed places shape it, Delete removes a corner', async () => {
    render(PlanHarness, { lasers });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    // 6 m × 4 m: corners (0,0) (6,0) (6,4) (0,4). Two corners on the north side, then the notch.
    await fireEvent.keyDown(screen.getByRole('button', { name: 'Add a room corner between corners 3 and 4' }), { key: 'Enter' });
    await fireEvent.click(screen.getByRole('button', { name: 'Add a room corner between corners 3 and 4' }));
    expect(plan().outline).toHaveLength(6);
    // Corners now (0,0) (6,0) (6,4) (4.5,4) (3,4) (0,4); typed to (6,2) and (3,2): an L with the
    // notch in the north-east (derived by hand; each step keeps the sides from crossing).
    for (const [label, value] of [
      ['Room corner 4, y in metres', '2'],
      ['Room corner 3, y in metres', '2'],
      ['Room corner 4, x in metres', '3'],
    ] as const) {
      const box = screen.getByLabelText(label);
      await fireEvent.input(box, { target: { value } });
      await fireEvent.change(box, { target: { value } });
    }
    expect(plan().outline).toEqual([{ x_m: 0, y_m: 0 }, { x_m: 6, y_m: 0 }, { x_m: 6, y_m: 2 }, { x_m: 3, y_m: 2 }, { x_m: 3, y_m: 4 }, { x_m: 0, y_m: 4 }]);
    expect(screen.queryByRole('alert')).toBeNull();
    // Delete on a corner removes it; the outline keeps at least 3 corners.
    await fireEvent.keyDown(screen.getByRole('button', { name: /^Room corner 6: / }), { key: 'Delete' });
    expect(plan().outline).toHaveLength(5);
    await fireEvent.click(screen.getByRole('button', { name: 'Undo: remove room corner 6' }));
    expect(plan().outline).toHaveLength(6);
  });
});

describe('handles never cover each other (each stays reachable with the mouse)', () => {
  /** Every handle and + of the drawing as a circle (a + square by the circle through its corners), in drawing units. */
  function shapes(): Array<{ name: string; x: number; y: number; r: number }> {
    const svg = screen.getByRole('group', { name: /Room plan, top view/ });
    const num = (e: Element, a: string) => Number(e.getAttribute(a));
    const circles = [...svg.querySelectorAll('circle.handle')].map((c) => ({ name: c.getAttribute('aria-label') ?? '', x: num(c, 'cx'), y: num(c, 'cy'), r: num(c, 'r') }));
    const pluses = [...svg.querySelectorAll('g.side-add')].map((g) => {
      const rect = g.querySelector('rect') as Element;
      const w = num(rect, 'width');
      return { name: g.getAttribute('aria-label') ?? '', x: num(rect, 'x') + w / 2, y: num(rect, 'y') + w / 2, r: (w / 2) * Math.SQRT2 };
    });
    return [...circles, ...pluses];
  }
  function overlaps(): string[] {
    const all = shapes();
    const out: string[] = [];
    all.forEach((a, i) => all.slice(i + 1).forEach((b) => Math.hypot(a.x - b.x, a.y - b.y) < a.r + b.r && out.push(`${a.name} / ${b.name}`)));
    return out;
  }

  it('a door put on the middle of the north wall, a window on the middle of the south wall and a controlled area accepted as the room: no two handles overlap', async () => {
    render(PlanHarness, { lasers });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    // 6 m × 4 m: "+ Door" puts door D2's first side at (3, 4), the middle of the north side where its + is (derived).
    await fireEvent.click(screen.getByRole('button', { name: '+ Door' }));
    await fireEvent.click(screen.getByRole('button', { name: '+ Window' }));
    // The window's ends typed 0.05 m either side of the middle of the south side (3, 0).
    for (const [label, value] of [
      ['Window W1, one side, x in metres', '2.95'],
      ['Window W1, other side, x in metres', '3.05'],
    ] as const) {
      const box = screen.getByLabelText(label);
      await fireEvent.input(box, { target: { value } });
      await fireEvent.change(box, { target: { value } });
    }
    expect(plan().doors[1]?.a).toEqual({ x_m: 3, y_m: 4 });
    await fireEvent.input(screen.getByLabelText('Accept the room as the laser controlled area, by'), { target: { value: 'I. Calloway-Senn' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Accept boundary' }));
    expect(plan().controlledArea?.outline).toEqual(plan().outline);
    expect(shapes().length).toBe(4 + 4 + 4 + 4 + 4 + 2 + 2); // corners and + of room and area, two doors, one window, exit and dump
    expect(overlaps()).toEqual([]);
  });

  it('a handle drawn beside another still names and moves its own point (arrow keys)', async () => {
    render(PlanHarness, { lasers });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    await fireEvent.input(screen.getByLabelText('Accept the room as the laser controlled area, by'), { target: { value: 'I. Calloway-Senn' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Accept boundary' }));
    // Controlled area corner 1 stands for (0, 0), drawn beside room corner 1 and joined to it by a line; the arrow keys move the point itself.
    expect(screen.getByRole('group', { name: /Room plan, top view/ }).querySelectorAll('line.leader').length).toBe(4);
    const handle = screen.getByRole('button', { name: /^Controlled area corner 1: x 0\.00 m, y 0\.00 m/ });
    await fireEvent.keyDown(handle, { key: 'ArrowLeft' });
    expect(plan().controlledArea?.outline[0]).toEqual({ x_m: -0.1, y_m: 0 });
  });
});

describe('the aperture of a beam dump, typed with its unit (keyboard)', () => {
  // Derived: the dump is 3.5 m from the exit; the beam there is 2.3 mm + 3.5 m × 0.4 mrad = 3.7 mm at
  // the 1/e² points, and above the limit across 2·r = D·√(2·ln(D_L/D)) ≈ 8.5 mm (D = 3.7/√2 mm,
  // D_L ≈ 0.5 m: the NOHD is far beyond the room); a 5 mm dump is narrower, a 1 cm one wider.
  it('a bare number is millimetres, "1 cm" is read with its unit, a bad text is refused beside the field and keeps the plan', async () => {
    render(PlanHarness, { lasers });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    const box = screen.getByLabelText(/^Green laser, beam dump 1, aperture/);
    const findings = () => within(screen.getByRole('region', { name: 'Findings from the plan' })).queryAllByText(/is wider than beam dump 1/).map((n) => n.textContent);
    expect(findings()).toEqual([]);
    await fireEvent.change(box, { target: { value: '5' } });
    expect(plan().paths[0]?.elements[0]).toMatchObject({ kind: 'dump', aperture_m: 0.005 });
    expect(findings()).toHaveLength(1);
    expect(findings()[0]).toMatch(/^The beam of green 532 nm is wider than beam dump 1 where it meets it, 3\.5 m along its path \(8\.\d\d mm against 5 mm, the width across which the beam is above the limit\): part of the beam passes it/);
    await fireEvent.change(box, { target: { value: '1 cm' } });
    expect(plan().paths[0]?.elements[0]).toMatchObject({ aperture_m: 0.01 });
    expect(findings()).toEqual([]);
    await fireEvent.change(box, { target: { value: 'wide' } });
    expect(screen.getByRole('alert').textContent).toMatch(/^Aperture: /);
    expect(plan().paths[0]?.elements[0]).toMatchObject({ aperture_m: 0.01 });
    await fireEvent.change(box, { target: { value: '' } });
    expect(plan().paths[0]?.elements[0]).not.toHaveProperty('aperture_m');
  });
});
