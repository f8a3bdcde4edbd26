/**
 * The derivation window shows the derivation's numbers in engineering notation with SI prefixes and
 * every figure kept, as the report's appendix prints them (test/backend/pdf/trace-numbers.test.ts
 * reads the PDF for the same cases). Cases and their sources: test/support/trace-numbers-cases.ts.
 */
import { describe, expect, it } from 'vitest';
import { render } from '@testing-library/svelte';
import { evaluateRoom } from '../../core/index.js';
import TraceView from '../../renderer/components/TraceView.svelte';
import { TRACE_NUMBERS_CASES } from '../support/trace-numbers-cases.js';

describe('the derivation window shows the numbers as the officer reads them', () => {
  it.each(TRACE_NUMBERS_CASES)('$what', ({ room, readable, raw }) => {
    const beam = evaluateRoom(room).beams[0];
    if (!beam) throw new Error('no beam result');
    const window = render(TraceView, { props: { trace: beam.trace } });
    const text = (window.container.textContent ?? '').replace(/\s+/g, ' ');
    for (const r of readable) expect(text).toContain(r);
    for (const r of raw) expect(text).not.toContain(r);
    window.unmount();
  });
});
