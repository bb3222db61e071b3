import AxeBuilder from '@axe-core/playwright';
import type { Page } from 'playwright-core';

/** axe-core findings that block or seriously hinder someone (WCAG impact "serious" or "critical"). */
export async function seriousViolations(page: Page): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).analyze();
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id}: ${v.help} (${v.nodes.length})`);
}
