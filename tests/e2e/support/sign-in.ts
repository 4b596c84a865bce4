import type { Page } from 'playwright-core';
import { BASE_URL } from './open-browser';

/** Fills the sign-in form as a person would and waits for the signed-in home. */
export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByTestId('home-email').waitFor();
}
