import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAppServer, type RunningApp } from './helpers/app-server';
import { launchBrowser, type TestBrowser } from './helpers/browser';
import { DEMO_USERS, signInAs } from './helpers/sign-in';

/**
 * A page on another port of the same host is the same *site* as Tackline, so the
 * SameSite=Lax session cookie goes with its requests. It tries what such a page can do
 * without a CORS preflight: a text/plain form post, and no-cors fetches with and without
 * a body. Every one must reach the server, be refused, and change nothing.
 */
describe('a page on another port of the same host cannot act for the signed-in user', () => {
  let app: RunningApp;
  let browser: TestBrowser;
  let evil: Server;
  let evilUrl: string;
  let attackPage = '';

  beforeAll(async () => {
    app = await startAppServer();
    browser = await launchBrowser();
    evil = createServer((_req, res) => {
      res.setHeader('Content-Type', 'text/html; charset=utf-8');
      res.end(attackPage);
    });
    await new Promise<void>((resolve) => evil.listen(0, '127.0.0.1', resolve));
    evilUrl = `http://127.0.0.1:${(evil.address() as AddressInfo).port}/`;
  }, 120_000);

  afterAll(async () => {
    await browser?.close();
    await new Promise((resolve) => evil?.close(resolve));
    await app?.stop();
  });

  it(
    'forms and no-cors fetches are refused; the job, spool and revisions are unchanged',
    { timeout: 90_000 },
    async () => {
      const page = await browser.freshPage();
      await page.goto(`${app.baseUrl}/`);
      await signInAs(page, DEMO_USERS.detailer);

      const api = browser.context.request;
      const read = async (path: string) => {
        const res = await api.get(`${app.baseUrl}/api${path}`);
        expect(res.status(), path).toBe(200);
        return (await res.json()) as Record<string, unknown>;
      };
      const jobs = (await read('/jobs')) as { items: Array<{ id: string }>; total: number };
      const jobId = jobs.items[0]!.id;
      const spools = (await read(`/jobs/${jobId}/spools`)) as { items: Array<{ id: string }> };
      const spoolId = spools.items[0]!.id;
      const state = async () =>
        JSON.stringify({
          jobs: (await read('/jobs?includeArchived=true')).total,
          job: await read(`/jobs/${jobId}`),
          spool: await read(`/spools/${spoolId}`),
          revisions: await read(`/spools/${spoolId}/revisions`),
        });
      const before = await state();

      const base = app.baseUrl;
      attackPage = `<!doctype html><title>win a prize</title>
<iframe name="sink"></iframe>
<form id="f" method="POST" enctype="text/plain" target="sink" action="${base}/api/jobs/${jobId}/archive">
  <input name='{"version":1, "x":"' value='"}'>
</form>
<script>
(async () => {
  const opts = { method: 'POST', mode: 'no-cors', credentials: 'include' };
  await fetch('${base}/api/spools/${spoolId}/draft', opts).catch(() => {});
  await fetch('${base}/api/spools/${spoolId}/draft/issue', opts).catch(() => {});
  await fetch('${base}/api/jobs', { ...opts, headers: { 'Content-Type': 'text/plain' },
    body: JSON.stringify({ number: 'FORGED-1', title: 'x', client: 'x', spec: {} }) }).catch(() => {});
  await fetch('${base}/api/auth/sign-out', opts).catch(() => {});
  document.getElementById('f').submit();
  document.title = 'sent';
})();
</script>`;

      const answers: Array<{ url: string; status: number }> = [];
      // Every forged request leaves the browser; the answers to no-cors fetches may never reach
      // the page (the Cross-Origin-Resource-Policy header blocks them), so requests are counted
      // separately and refusal is proven by the records staying unchanged.
      const sent: string[] = [];
      page.on('request', (r) => {
        if (r.url().startsWith(`${base}/api/`) && r.method() === 'POST') sent.push(r.url().slice(base.length));
      });
      page.on('response', (r) => {
        if (r.url().startsWith(`${base}/api/`) && r.request().method() === 'POST') {
          answers.push({ url: r.url().slice(base.length), status: r.status() });
        }
      });
      const formAnswered = page.waitForResponse((r) => r.url().endsWith(`/api/jobs/${jobId}/archive`));
      await page.goto(evilUrl);
      await page.waitForFunction(() => document.title === 'sent');
      await formAnswered;

      // All five were sent, and every answer the page saw was a refusal.
      expect([...new Set(sent)].sort()).toEqual(
        [
          '/api/auth/sign-out',
          '/api/jobs',
          `/api/jobs/${jobId}/archive`,
          `/api/spools/${spoolId}/draft`,
          `/api/spools/${spoolId}/draft/issue`,
        ].sort(),
      );
      expect(answers.length).toBeGreaterThan(0);
      for (const a of answers) expect([400, 403], a.url).toContain(a.status);
      expect(await state()).toBe(before);
      // Still signed in: the forged sign-out did nothing either.
      expect((await api.get(`${base}/api/auth/me`)).status()).toBe(200);
    },
  );
});
