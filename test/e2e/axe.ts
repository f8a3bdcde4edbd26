/**
 * WCAG 2.1 AA check of the page as it stands, with axe-core (rules tagged wcag2a, wcag2aa, wcag21a,
 * wcag21aa). The engine is evaluated through the debugging protocol, so the app's content security
 * policy stays as shipped. Returns one line per violation: rule, impact and the elements.
 */
import axe from 'axe-core';
import type { Page } from 'playwright-core';

interface AxeNode {
  readonly target: readonly string[];
}
interface AxeViolation {
  readonly id: string;
  readonly impact: string | null;
  readonly help: string;
  readonly nodes: readonly AxeNode[];
}

export async function wcagViolations(page: Page): Promise<string[]> {
  await page.evaluate(axe.source);
  const violations = await page.evaluate(async () => {
    const engine = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: AxeViolation[] }> } }).axe;
    const r = await engine.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] } });
    return r.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => ({ target: [...n.target] })) }));
  });
  return violations.map((v) => `${v.id} (${v.impact ?? '?'}): ${v.help} — ${v.nodes.slice(0, 5).map((n) => n.target.join(' ')).join(' | ')}`);
}
