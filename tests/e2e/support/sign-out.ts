import type { Page } from 'playwright-core';
import { theme } from '../../../constants/theme';

/**
 * Signs out as a person would: from the side rail on a wide screen, from "More" on a phone.
 * Decided by the viewport, not by what is on screen: just after a resize the old frame can
 * still show a button that is about to go.
 */
export async function signOut(page: Page): Promise<void> {
  if ((page.viewportSize()?.width ?? 0) < theme.wide) {
    await page.getByRole('link', { name: 'More', exact: true }).click();
  }
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
}
