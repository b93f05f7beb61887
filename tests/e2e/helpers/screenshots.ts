import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { Page } from 'playwright-core';

/** Screenshots land here (git-ignored) for a person to look at after the run. */
export const SCREENSHOT_DIR = path.resolve(import.meta.dirname, '../../../test-output/screenshots');

/** Saves a full-page screenshot as `<name>.png` and returns its path. */
export async function saveScreenshot(page: Page, name: string): Promise<string> {
  await mkdir(SCREENSHOT_DIR, { recursive: true });
  const file = path.join(SCREENSHOT_DIR, `${name}.png`);
  // Let web fonts finish so the picture shows the real type.
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
