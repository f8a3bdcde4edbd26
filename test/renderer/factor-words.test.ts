/**
 * The result card and the derivation window name the correction factors with the same words as
 * the printed report (test/backend/pdf/factor-words.test.ts reads the PDF for the same cases):
 * one source of the words, core/model/factor-words.ts. Cases and their sources:
 * test/support/factor-words-cases.ts.
 */
import { describe, expect, it } from 'vitest';
import { render } from '@testing-library/svelte';
import { evaluateRoom } from '../../core/index.js';
import BeamResultCard from '../../renderer/components/BeamResultCard.svelte';
import TraceView from '../../renderer/components/TraceView.svelte';
import { FACTOR_WORDS_CASES, OLD_FACTOR_WORDS } from '../support/factor-words-cases.js';

function squash(s: string | null | undefined): string {
  return (s ?? '').replace(/\s+/g, ' ');
}

describe('the card and the derivation window name each factor as the report does', () => {
  it.each(FACTOR_WORDS_CASES)('$what', ({ room, warningWords, stepWords }) => {
    const beam = evaluateRoom(room).beams[0];
    if (!beam) throw new Error('no beam result');
    const card = render(BeamResultCard, { props: { beam, laserName: room.lasers[0]?.name ?? '', classAsLabelled: undefined, input: room.lasers[0]?.beams[0], settings: undefined, habit: 'SI', ontrace: () => undefined } });
    // the card lowers a symbol's subscript as the derivation window does (<sub>): written back with its underscore here
    for (const sub of card.container.querySelectorAll('sub')) sub.textContent = `_${sub.textContent ?? ''}`;
    const cardText = squash(card.container.textContent);
    for (const w of warningWords) expect(cardText).toContain(w);
    expect(cardText).not.toMatch(OLD_FACTOR_WORDS);
    card.unmount();
    const window = render(TraceView, { props: { trace: beam.trace } });
    // the derivation window lowers a symbol's subscript (<sub>, core/units/formula-text.ts): written
    // back with its underscore here, so "C<sub>C</sub>" is told from an unlowered "CC"
    for (const sub of window.container.querySelectorAll('sub')) sub.textContent = `_${sub.textContent ?? ''}`;
    const labels = [...window.container.querySelectorAll('td.label')].map((td) => squash(td.textContent));
    for (const w of stepWords) expect(labels).toContain(w);
    expect(squash(window.container.textContent)).not.toMatch(OLD_FACTOR_WORDS);
  });
});
