import type { Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../../server/db/seed/demo-data';

/** Demo sign-ins of the invented shop (see README). */
export const DEMO_USERS = {
  admin: 'admin@kestrel.example',
  detailer: 'detailer@kestrel.example',
  fabricator: 'fabricator@kestrel.example',
  inspector: 'inspector@kestrel.example',
  viewer: 'viewer@kestrel.example',
} as const;

/** Fills the sign-in form as a person would and waits for the app shell. */
export async function signInAs(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('button', { name: 'Sign out' }).waitFor();
}

/** Signs out through the header button and waits for the sign-in page. */
export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.getByRole('heading', { name: 'Sign in' }).waitFor();
}
