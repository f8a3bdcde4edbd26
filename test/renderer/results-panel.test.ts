/**
 * The results panel shows the core's own numbers (nothing recomputed or re-rounded against the safe
 * direction), the governing rule, the derivation one click away, the caution, and what keeps a
 * beam out of the evaluation. Inputs follow published worked examples (test/fixtures/worked-examples.json):
 * - au-appx-x-mpe-488nm-0p25s: 488 nm CW, 0.25 s: MPE 25.5 W/m² (Faculty of Science laser safety
 *   manual, 'Appendix X - Sample Calculations', 2 Sep 2015, p.1; AS/NZS 2211.1:2004);
 * - lipg-ch1-nohd-1W-1mrad: 1 W visible CW, 1 mrad, 0.25 s: NOHD 225 m (The Laser-IPL Guys,
 *   'Lasers and IPLs in Medical/Aesthetic Applications' v1.2, ch. 1 p.110).
 */
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import { evaluateRoom, RESULT_CAUTION, type RoomInput } from '../../core/index.js';
import ResultsPanel from '../../renderer/components/ResultsPanel.svelte';
import { evaluateDraftInput } from '../../renderer/lib/evaluate.js';

function room(beam: RoomInput['lasers'][number]['beams'][number], name: string): RoomInput {
  return { ruleSet: 'icnirp2013', lasers: [{ id: 'L1', name, classAsLabelled: '3B', beams: [beam] }], eyewear: [] };
}

const cases = [
  {
    id: 'au-appx-x-mpe-488nm-0p25s',
    input: room(
      { id: 'b488', label: 'argon 488', wavelength_nm: 488, emission: { kind: 'cw', power_W: 0.01 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' }, exposureDuration_s: 0.25 },
      'Argon-ion laser',
    ),
    check: 'mpe' as const,
    published: 25.5,
    tolerance: 0.01,
  },
  {
    id: 'lipg-ch1-nohd-1W-1mrad',
    input: room(
      // exit diameter not given in the source: a vanishing one (the source uses 0)
      { id: 'b532', label: 'green 1 W', wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 1e-6, divergence_rad: 0.001, definition: '1/e' }, exposureDuration_s: 0.25 },
      'Green CW laser',
    ),
    check: 'nohd' as const,
    published: 225,
    tolerance: 0.02,
  },
];

describe('ResultsPanel shows the core values', () => {
  it.each(cases)('$id', ({ input, check, published, tolerance }) => {
    const evaluation = evaluateDraftInput(input);
    if (!evaluation.ok) throw new Error(evaluation.message);
    const core = evaluateRoom(input).beams[0];
    if (!core) throw new Error('no beam result');
    render(ResultsPanel, { props: { evaluation, lasers: input.lasers, habit: 'SI' } });

    const card = screen.getByRole('article', { name: new RegExp(input.lasers[0]!.name) });
    const nohd = within(card).getByTestId('nohd');
    const od = within(card).getByTestId('od');
    // exactly the core's safe-rounded values
    expect(nohd.getAttribute('data-value')).toBe(core.nohd_m_reported);
    expect(od.getAttribute('data-value')).toBe(core.odRequired);
    expect(od.textContent).toBe(`OD ${core.odRequired}`);

    if (check === 'mpe') {
      const shown = within(card).getByTestId('mpe').textContent ?? '';
      const value = Number(shown.replace(/\s*W\/m².*$/, ''));
      expect(shown).toMatch(/W\/m²$/);
      expect(Math.abs(value - published) / published).toBeLessThanOrEqual(tolerance);
      // rounded DOWN (a limit): never above the core's full-precision value
      expect(value).toBeLessThanOrEqual(Number(core.mpe.E_Wm2));
    } else {
      const value = Number((nohd.textContent ?? '').replace(/\s*m$/, ''));
      expect(Math.abs(value - published) / published).toBeLessThanOrEqual(tolerance);
      // rounded UP (a distance): never below the core's full-precision value
      expect(value).toBeGreaterThanOrEqual(Number(core.nohd_m));
    }
    // governing rule named, caution shown
    expect(card.textContent).toContain('continuous exposure governs');
    expect(screen.getByRole('note', { name: 'Caution' }).textContent).toContain(RESULT_CAUTION);
  });

  it('opens the derivation of the NOHD in a dialog', async () => {
    const input = cases[1]!.input;
    const evaluation = evaluateDraftInput(input);
    render(ResultsPanel, { props: { evaluation, lasers: input.lasers, habit: 'SI' } });
    await fireEvent.click(screen.getAllByRole('button', { name: 'derivation' })[0]!);
    await new Promise((r) => setTimeout(r, 0));
    const dialog = screen.getByRole('dialog', { hidden: true });
    expect(within(dialog).getByRole('heading', { level: 2, name: /^NOHD: green 1 W/, hidden: true })).toBeTruthy();
    expect(dialog.textContent).toMatch(/Range equation|NOHD/);
  });

  it('shows the limit in the ANSI habit (W/cm²) when chosen: 25.5 W/m² = 2.55 mW/cm²', () => {
    const input = cases[0]!.input;
    const evaluation = evaluateDraftInput(input);
    render(ResultsPanel, { props: { evaluation, lasers: input.lasers, habit: 'ANSI' } });
    // source value 2.55 mW/cm² (same worked example); the core gives 25.46 W/m² -> 2.54 mW/cm² rounded down
    expect(screen.getByTestId('mpe').textContent).toMatch(/^2\.5\d mW\/cm²$/);
  });

  it('lists beams left out with what to fix, and a core refusal in officer words beside them', () => {
    const bad = evaluateDraftInput(room({ id: 'x', wavelength_nm: 100, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } }, 'Too short'));
    render(ResultsPanel, {
      props: { evaluation: bad, lasers: [], habit: 'SI', incomplete: [{ name: 'Laser 2 / beam 1', problems: ['Power is required'] }] },
    });
    const box = screen.getByTestId('not-evaluated').textContent ?? '';
    expect(box).toContain('Laser 2 / beam 1: Power is required');
    // ICNIRP 2013 / EU 2006 limit tables start at 180 nm (limit specification, section 0)
    expect(box).toContain('Too short / beam 1: Wavelength must be from 180 nm to 1000000 nm (the limit tables cover 180 nm to 1 mm) (got 100)');
    expect(screen.queryByRole('alert')).toBeNull();
  });
});
