import AxeBuilder from '@axe-core/playwright';
import type { Page } from 'playwright-core';

/** axe-core findings that block or seriously hinder someone (impact "serious" or "critical"). */
export async function seriousViolations(page: Page): Promise<string[]> {
  const found = await violationsOnceSettled(page);
  // A snack bar that starts its entrance while axe runs is measured half-faded: a second look,
  // once it has settled, tells a real finding (it stays) from a passing one.
  return found.length === 0 ? found : violationsOnceSettled(page);
}

async function violationsOnceSettled(page: Page): Promise<string[]> {
  // Colours are measured as painted: let fade-ins (a field's error, a button's ripple) finish first.
  // (Endless ones, such as a spinning sync icon, are left alone.)
  await page.evaluate(() =>
    Promise.all(
      document
        .getAnimations()
        .filter((animation) => animation.effect?.getComputedTiming().endTime !== Infinity)
        .map((animation) => animation.finished.catch(() => undefined)),
    ),
  );
  const { violations } = await new AxeBuilder({ page }).analyze();
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`);
}
