import AxeBuilder from '@axe-core/playwright';
import type { Page } from 'playwright-core';

/**
 * axe-core's WCAG 2.x A and AA rules on the page as it is now; returns the serious and critical
 * violations as readable lines (empty when there are none), so a failing test says what to fix.
 */
export async function seriousAccessibilityViolations(page: Page): Promise<string[]> {
  const result = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return result.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.slice(0, 5).map((n) => n.target.join(' ')).join(' | ')}`);
}
