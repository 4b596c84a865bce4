import type { Page } from 'playwright-core';

/** Follows a navigation link as a person would: straight from the rail or tab bar, or through "More" on a phone. */
export async function goTo(page: Page, label: string): Promise<void> {
  const link = page.getByRole('link', { name: label, exact: true });
  if ((await link.count()) === 0) {
    await page.getByRole('link', { name: 'More', exact: true }).click();
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
  }
  await link.first().click();
}
