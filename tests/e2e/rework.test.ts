import type { APIRequestContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it, onTestFailed } from 'vitest';
import { startAppServer, type RunningApp } from './helpers/app-server';
import { launchBrowser, type TestBrowser } from './helpers/browser';
import { saveScreenshot } from './helpers/screenshots';
import { DEMO_USERS, signInAs, signOut } from './helpers/sign-in';

// A detailer re-issues a spool the bay has already welded, after turning one of its outlets:
// the issue dialog names the stage the spool goes back to (fit-up again: back to cut) and the
// changes, the spool page flags the rework, and the fabricator clears it when done.

const MARK = 'CW-410-S02';

describe('rework after a revision issued over work in progress', () => {
  let app: RunningApp;
  let browser: TestBrowser;

  beforeAll(async () => {
    app = await startAppServer();
    browser = await launchBrowser();
  }, 120_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  /** JSON API call from the page's signed-in context, as the app's own pages make it. */
  async function api(request: APIRequestContext, method: 'get' | 'post' | 'put', path: string, data?: unknown) {
    const res = await request.fetch(`${app.baseUrl}/api${path}`, {
      method,
      headers: { 'Content-Type': 'application/json', Origin: app.baseUrl },
      data: data === undefined ? (method === 'get' ? undefined : {}) : data,
    });
    if (!res.ok()) throw new Error(`${method} ${path}: ${res.status()} ${await res.text()}`);
    return (await res.json()) as Record<string, unknown>;
  }

  function keepPictureOnFailure(page: Page, name: string): void {
    onTestFailed(async () => {
      await saveScreenshot(page, `failed-${name}`).catch(() => undefined);
    });
  }

  it('names the stage, flags the spool, and the bay clears the flag', { timeout: 120_000 }, async () => {
    const page = await browser.freshPage();
    keepPictureOnFailure(page, 'rework');
    await page.goto(`${app.baseUrl}/`);
    await signInAs(page, DEMO_USERS.admin);
    // Setup as the admin: issue revision A, record the spool welded, open draft B and turn C2.
    const jobs = (await api(page.request, 'get', '/jobs')) as { items: Array<{ id: string }> };
    let spoolId = '';
    for (const job of jobs.items) {
      const spools = (await api(page.request, 'get', `/jobs/${job.id}/spools?pageSize=100`)) as {
        items: Array<{ id: string; mark: string }>;
      };
      spoolId = spools.items.find((s) => s.mark === MARK)?.id ?? spoolId;
    }
    expect(spoolId).not.toBe('');
    await api(page.request, 'post', `/spools/${spoolId}/draft/issue`, { note: 'Issued for fabrication' });
    const issued = await api(page.request, 'get', `/spools/${spoolId}`);
    await api(page.request, 'post', `/spools/${spoolId}/status`, { status: 'welded', version: issued.version });
    const draft = (await api(page.request, 'post', `/spools/${spoolId}/draft`)) as {
      design: { nodes: Array<{ id: string; orientationDeg?: number }> };
      version: number;
    };
    const gauge = draft.design.nodes.find((n) => n.orientationDeg === 90)!;
    gauge.orientationDeg = 180;
    await api(page.request, 'put', `/spools/${spoolId}/draft`, { design: draft.design, version: draft.version });
    await signOut(page);

    await page.goto(`${app.baseUrl}/spools/${spoolId}`);
    await signInAs(page, DEMO_USERS.detailer);
    await page.getByRole('heading', { name: MARK }).waitFor();
    await page.getByRole('button', { name: 'Issue revision B' }).click();
    const dialog = page.getByRole('dialog', { name: 'Issue this revision' });
    await dialog.getByLabel(/What changed/).fill('Gauge connection turned to the bottom');
    await dialog.getByRole('button', { name: 'Issue revision' }).click();
    const confirmation = dialog.getByTestId('rework-confirmation');
    await confirmation.waitFor();
    await expect(confirmation.textContent()).resolves.toMatch(/welded.*sends it back to cut \(not fitted\)/);
    await expect(confirmation.textContent()).resolves.toMatch(/O2: orientation was 90° from top of pipe, now 180° from top of pipe/);
    await saveScreenshot(page, 'rework-01-confirm');
    await dialog.getByRole('button', { name: 'Send back to cut (not fitted) and issue' }).click();
    await dialog.waitFor({ state: 'hidden' });
    const notice = page.getByTestId('rework-notice');
    await notice.waitFor();
    await expect(notice.textContent()).resolves.toMatch(/while the spool was welded: it went back to cut/);
    // Detailers issue; the bay says when the rework is done.
    await expect(notice.getByRole('button', { name: 'Rework done' }).count()).resolves.toBe(0);
    await saveScreenshot(page, 'rework-02-flagged');
    await signOut(page);

    await page.goto(`${app.baseUrl}/spools/${spoolId}`);
    await signInAs(page, DEMO_USERS.fabricator);
    await notice.waitFor();
    await page.getByRole('button', { name: 'Record as fitted up' }).waitFor();
    await notice.getByRole('button', { name: 'Rework done' }).click();
    await notice.waitFor({ state: 'detached' });
    await saveScreenshot(page, 'rework-03-cleared');
    await page.close();
  });

  it('an archived job reads as read-only: no design, progress or rework controls', { timeout: 90_000 }, async () => {
    const page = await browser.freshPage();
    keepPictureOnFailure(page, 'archived-job');
    await page.goto(`${app.baseUrl}/`);
    await signInAs(page, DEMO_USERS.admin);
    const jobs = (await api(page.request, 'get', '/jobs')) as { items: Array<{ id: string; version: number }> };
    const job = jobs.items[0]!;
    const spools = (await api(page.request, 'get', `/jobs/${job.id}/spools?pageSize=100`)) as {
      items: Array<{ id: string; mark: string }>;
    };
    const spool = spools.items[0]!;
    await api(page.request, 'post', `/jobs/${job.id}/archive`, { version: job.version });
    await page.goto(`${app.baseUrl}/spools/${spool.id}`);
    await page.getByTestId('job-archived-banner').waitFor();
    await page.getByText('Loading the editor…').waitFor({ state: 'detached' });
    await expect(
      page.getByRole('button', { name: /Issue revision|Start|Record as|Rework done|Edit mark|Archive/ }).count(),
    ).resolves.toBe(0);
    await saveScreenshot(page, 'archived-job-spool');
    await page.goto(`${app.baseUrl}/jobs/${job.id}`);
    await page.getByTestId('job-archived-banner').waitFor();
    await expect(page.getByRole('button', { name: /New spool|Add spool/ }).count()).resolves.toBe(0);
    await page.close();
  });
});
