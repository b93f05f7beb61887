import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** Debian's Chromium; never a downloaded browser build. */
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

/** A headless Chromium with a fresh profile; `close` also deletes the profile folder. */
export interface TestBrowser {
  context: BrowserContext;
  /**
   * A new page with nobody signed in. Closes every other page first: an open page
   * that refetches would set the (rolling) session cookie again after clearing.
   */
  freshPage: () => Promise<Page>;
  close: () => Promise<void>;
}

/** Launches Chromium on a throwaway profile at a laptop-sized viewport. */
export async function launchBrowser(viewport = { width: 1280, height: 860 }): Promise<TestBrowser> {
  const profileDir = await mkdtemp(path.join(tmpdir(), 'tackline-e2e-profile-'));
  try {
    const context = await chromium.launchPersistentContext(profileDir, {
      executablePath: CHROMIUM_PATH,
      headless: true,
      viewport,
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    });
    return {
      context,
      freshPage: async () => {
        await Promise.all(context.pages().map((p) => p.close()));
        await context.clearCookies();
        return context.newPage();
      },
      close: async () => {
        try {
          await context.close();
        } finally {
          await rm(profileDir, { recursive: true, force: true });
        }
      },
    };
  } catch (error) {
    await rm(profileDir, { recursive: true, force: true });
    throw error;
  }
}
