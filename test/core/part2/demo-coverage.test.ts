// The invented demo rooms (test/fixtures/demo-rooms.json, a copy of the rooms of
// assets/demo/demo-scenario.json, which follows the project's demo scenario): every cell of each
// room's eyewear coverage matrix must agree with a single-beam evaluation of that beam checked
// against that eyewear. Invented data: these are consistency checks, not check values.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, evaluateRoom, eyewearVerdict, type RoomInput } from '../../../core/index.js';
import fixture from '../../fixtures/demo-rooms.json' with { type: 'json' };
import demo from '../../../assets/demo/demo-scenario.json' with { type: 'json' };

const rooms = (fixture as unknown as { rooms: Array<{ code: string; name: string; input: RoomInput }> }).rooms;

describe('demo rooms: coverage matrix = single-beam evaluations', () => {
  it('the fixture is the demo data the application ships', () => {
    expect(rooms.map((r) => r.input)).toEqual((demo as unknown as { rooms: Array<{ input: RoomInput }> }).rooms.map((r) => r.input));
  });
  it.each(rooms.map((r) => [r.code, r] as const))('%s', (_code, room) => {
    const result = evaluateRoom(room.input);
    const beams = room.input.lasers.flatMap((l) => l.beams);
    const eyewear = room.input.eyewear ?? [];
    expect(result.coverage.length).toBe(beams.length * eyewear.length);
    for (const beam of beams) {
      const single = evaluateBeam({ ...beam, ruleSet: room.input.ruleSet ?? 'icnirp2013' });
      const inRoom = result.beams.find((b) => b.beamId === single.beamId);
      expect(inRoom?.odRequired).toBe(single.odRequired);
      expect(inRoom?.nohd_m).toBe(single.nohd_m);
      for (const ew of eyewear) {
        const cell = result.coverage.find((v) => v.beamId === single.beamId && v.eyewearId === ew.id);
        const expected = eyewearVerdict({ beamId: single.beamId, wavelength_nm: single.wavelength_nm, odRequired: single.odRequired, scaleNumbers: single.scaleNumbers }, ew);
        expect(cell).toEqual(expected);
      }
    }
    // eyewear covering all = the columns whose every cell is adequate
    const all = eyewear.filter((ew) => result.coverage.filter((v) => v.eyewearId === ew.id).every((v) => v.adequate)).map((e) => e.id);
    expect(result.eyewearCoveringAll).toEqual(all);
    expect(result.caution).toMatch(/do not replace/);
    expect(result.purchaseAdvice.length).toBeGreaterThan(0);
  });
  it('the telecom bench is covered by EW-E alone; the ultrafast laboratory by no single eyewear', () => {
    const byCode = new Map(rooms.map((r) => [r.code, evaluateRoom(r.input)]));
    expect(byCode.get('A0.07')?.eyewearCoveringAll).toEqual(['EW-E']);
    expect(byCode.get('B2.14')?.eyewearCoveringAll).toEqual([]);
    expect(byCode.get('B2.14')?.purchaseAdvice.join(' ')).toMatch(/No single eyewear/);
  });
});
