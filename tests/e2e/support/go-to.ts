import type { Page } from 'playwright-core';
import { NAV_ITEMS } from '../../../client/nav-items';
import { theme } from '../../../constants/theme';

/** Follows a navigation link as a person would: from the rail on a wide screen, from the tab bar or "More" on a phone. */
export async function goTo(page: Page, label: string): Promise<void> {
  const primary = NAV_ITEMS.find((item) => item.label === label)?.primary ?? true;
  if (!primary && (page.viewportSize()?.width ?? 0) < theme.wide) {
    await page.getByRole('link', { name: 'More', exact: true }).click();
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
  }
  await page.getByRole('link', { name: label, exact: true }).first().click();
}
