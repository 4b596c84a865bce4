import type { Page } from 'playwright-core';

/** Signs out as a person would: from the side rail on a wide screen, from "More" on a phone. */
export async function signOut(page: Page): Promise<void> {
  const button = page.getByRole('button', { name: 'Sign out' });
  if ((await button.count()) === 0) await page.getByRole('link', { name: 'More' }).click();
  await button.click();
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
}
