import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { Job } from '../../shared/schemas/job.schema';
import type { Spool } from '../../shared/schemas/spool.schema';
import { startAppServer, type RunningApp } from './helpers/app-server';
import { launchBrowser, type TestBrowser } from './helpers/browser';
import { saveScreenshot } from './helpers/screenshots';
import { DEMO_USERS, signInAs } from './helpers/sign-in';

/** Accessible name and description of every button and radio, from Chromium's accessibility tree. */
async function controlNames(page: Page): Promise<{ role: string; name: string; description: string }[]> {
  const cdp = await page.context().newCDPSession(page);
  const { nodes } = (await cdp.send('Accessibility.getFullAXTree')) as {
    nodes: { ignored?: boolean; role?: { value?: string }; name?: { value?: string }; description?: { value?: string } }[];
  };
  await cdp.detach();
  return nodes
    .filter((n) => !n.ignored && ['button', 'radio', 'togglebutton'].includes(n.role?.value ?? ''))
    .map((n) => ({ role: n.role?.value ?? '', name: String(n.name?.value ?? ''), description: String(n.description?.value ?? '') }));
}

/** A name read twice: "Up (Up)", or a tooltip description that repeats the name. */
function readTwice(c: { name: string; description: string }): boolean {
  const name = c.name.trim().toLowerCase();
  if (/^(.+?)\s*\(\1\)$/.test(name)) return true;
  return name.length > 1 && c.description.toLowerCase().includes(name);
}

describe('small screens and accessible names', () => {
  let app: RunningApp;
  let browser: TestBrowser;

  beforeAll(async () => {
    app = await startAppServer();
    browser = await launchBrowser({ width: 390, height: 844 });
  }, 120_000);

  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it('at phone width the job and spool lists are cards showing mark, status and revision, with no sideways scroll', { timeout: 90_000 }, async () => {
    const page = await browser.freshPage();
    await page.goto(`${app.baseUrl}/`);
    await signInAs(page, DEMO_USERS.detailer);
    const jobs = page.getByRole('list', { name: 'Jobs' });
    await jobs.waitFor();
    const overflow = () => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(await overflow()).toBeLessThanOrEqual(0);
    const firstJob = jobs.getByRole('listitem').first();
    const status = firstJob.getByText('Status', { exact: true });
    const box = await status.boundingBox();
    expect(box && box.x + box.width).toBeLessThanOrEqual(390);
    await saveScreenshot(page, 'phone-01-jobs');

    const list = (await (await page.request.get(`${app.baseUrl}/api/jobs`)).json()) as { items: Job[] };
    const job = list.items.find((j) => j.spoolCount > 0)!;
    await page.goto(`${app.baseUrl}/jobs/${job.id}`);
    const spools = page.getByRole('list', { name: 'Spools of this job' });
    await spools.waitFor();
    expect(await overflow()).toBeLessThanOrEqual(0);
    const card = spools.getByRole('listitem').first();
    for (const label of ['Status', 'Issued rev.']) {
      const b = await card.getByText(label, { exact: true }).boundingBox();
      expect(b, label).not.toBeNull();
      expect(b!.x + b!.width, label).toBeLessThanOrEqual(390);
    }
    const spoolsJson = (await (await page.request.get(`${app.baseUrl}/api/jobs/${job.id}/spools`)).json()) as { items: Spool[] };
    await card.getByRole('link', { name: spoolsJson.items[0]!.mark }).waitFor().catch(() => undefined);
    await saveScreenshot(page, 'phone-02-spools');
  });

  it('no button or direction choice in the editor is read twice', { timeout: 90_000 }, async () => {
    const page = await browser.freshPage();
    await page.setViewportSize({ width: 1440, height: 1000 });
    await page.goto(`${app.baseUrl}/`);
    await signInAs(page, DEMO_USERS.detailer);
    const jobs = (await (await page.request.get(`${app.baseUrl}/api/jobs`)).json()) as { items: Job[] };
    const job = jobs.items[0]!;
    const created = await page.request.post(`${app.baseUrl}/api/jobs/${job.id}/spools`, { data: { mark: 'AX-900-S01', lineNumber: 'AX-900' } });
    expect(created.status()).toBe(201);
    const spool = (await created.json()) as Spool;
    await page.goto(`${app.baseUrl}/spools/${spool.id}`);
    await page.getByRole('button', { name: 'Start laying out' }).click();
    const begin = page.getByRole('form', { name: 'Begin the spool' });
    await begin.getByLabel('Main size').selectOption('6');
    await begin.getByRole('button', { name: 'Begin' }).click();
    await page.getByRole('form', { name: 'Add a run' }).waitFor();
    await page.getByRole('radio', { name: 'Up', exact: true }).waitFor();
    const controls = await controlNames(page);
    expect(controls.length).toBeGreaterThan(10);
    expect(controls.filter(readTwice)).toEqual([]);
    await saveScreenshot(page, 'editor-names-begun');
  });
});
