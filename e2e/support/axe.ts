// Runs axe-core (npm `axe-core`) in a page and returns its critical and serious violations, one line each.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

type AxeViolation = { id: string; impact: string | null; help: string; nodes: { target: string[] }[] };

/** The WCAG 2.x A/AA rules (axe's tags) on the whole document; "critical" and "serious" impacts only. */
export async function seriousViolations(page: Page): Promise<string[]> {
  // Evaluated through the browser's debugging protocol: the app's Content-Security-Policy (rightly) refuses inline scripts.
  await page.evaluate(AXE_SOURCE);
  // The function runs in the page (a string, so this file needs no DOM types).
  const violations = (await page.evaluate(`(async () => {
    const result = await window.axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] }, resultTypes: ['violations'] });
    return result.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => ({ target: n.target.map(String) })) }));
  })()`)) as AxeViolation[];
  return violations
    .filter((v) => v.impact === 'critical' || v.impact === 'serious')
    .map((v) => `${v.impact} ${v.id}: ${v.help} (${v.nodes.length}: ${v.nodes.slice(0, 3).map((n) => n.target.join(' ')).join(', ')})`);
}
