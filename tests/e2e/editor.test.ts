import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { computeSpool } from '../../shared/engine/compute-spool';
import { formatLength } from '../../shared/units/length-format';
import { jobSpecOverrides } from '../../shared/engine/job-spec-overrides';
import type { Job } from '../../shared/schemas/job.schema';
import type { Spool } from '../../shared/schemas/spool.schema';
import type { Revision } from '../../shared/schemas/revision.schema';
import { startAppServer, type RunningApp } from './helpers/app-server';
import { launchBrowser, type TestBrowser } from './helpers/browser';
import { saveScreenshot } from './helpers/screenshots';
import { DEMO_USERS, signInAs, signOut } from './helpers/sign-in';

/** What the cut list on screen says: piece mark, the mm behind it and the text shown. */
async function cutListOnScreen(page: Page): Promise<{ mark: string; mm: number; text: string }[]> {
  return page.locator('[data-testid="cut-list"] tbody tr').evaluateAll((rows) =>
    rows.map((row) => {
      const cell = row.querySelector('[data-cut-mm]') as HTMLElement;
      return { mark: row.getAttribute('data-piece') ?? '', mm: Number(cell.dataset.cutMm), text: cell.textContent ?? '' };
    }),
  );
}

async function streamBytes(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk));
  return Buffer.concat(chunks);
}

async function streamText(stream: NodeJS.ReadableStream): Promise<string> {
  return (await streamBytes(stream)).toString('utf8');
}

async function waitSaved(page: Page): Promise<void> {
  await page.locator('[data-testid="save-status"][data-status="saved"]').waitFor({ timeout: 15_000 });
}

/** Adds a run with the keyboard: direction key, the length typed into the box, Enter. */
async function addRun(page: Page, key: string, length: string, measured = 'Work point to work point'): Promise<void> {
  const form = page.getByRole('form', { name: 'Add a run' });
  const box = form.getByRole('textbox', { name: 'Length', exact: true });
  await page.keyboard.press(key);
  // The direction key puts the cursor in the length box.
  await expect.poll(() => box.evaluate((el) => el === document.activeElement)).toBe(true);
  await page.keyboard.type(length);
  await form.getByLabel('Measured').selectOption({ label: measured });
  await box.press('Enter');
  await expect.poll(() => box.evaluate((el) => el === document.activeElement)).toBe(false);
}

describe('spool editor in the browser', () => {
  let app: RunningApp;
  let browser: TestBrowser;
  let spoolId = '';
  let job: Job;

  beforeAll(async () => {
    app = await startAppServer();
    browser = await launchBrowser({ width: 1440, height: 1000 });
  }, 120_000);

  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  it('a detailer builds the 14" two-elbow return with a 6" set-on branch through the UI, and the cut list is the engine\'s', { timeout: 150_000 }, async () => {
    const page = await browser.context.newPage();
    const problems: string[] = [];
    page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
    // Content-Security-Policy: the page is served with one, and nothing it loads (scripts,
    // styles, workers, the WebGL scene) is refused: any violation, reported on the console or
    // as a securitypolicyviolation event, fails the test.
    const cspViolations: string[] = [];
    page.on('console', (m) => {
      if (/Content Security Policy/i.test(m.text())) cspViolations.push(`console: ${m.text()}`);
      if (m.type() === 'error' && !/status of 40[149]/.test(m.text())) problems.push(`console: ${m.text()}`);
    });
    await page.addInitScript(() => {
      document.addEventListener('securitypolicyviolation', (e) =>
        console.error(`Content Security Policy violation: ${e.violatedDirective} ${e.blockedURI} at ${e.sourceFile}:${e.lineNumber}:${e.columnNumber}`),
      );
    });
    const documentResponse = await page.goto(`${app.baseUrl}/`);
    expect(documentResponse?.headers()['content-security-policy']).toContain("script-src 'self';");
    await signInAs(page, DEMO_USERS.detailer);

    // Set-up only (not what is under test): a fresh spool in the demo job.
    const jobs = (await (await page.request.get(`${app.baseUrl}/api/jobs`)).json()) as { items: Job[] };
    job = jobs.items.find((j) => j.number === 'HFD-B-CW')!;
    const created = await page.request.post(`${app.baseUrl}/api/jobs/${job.id}/spools`, { data: { mark: 'CW-990-S01', lineNumber: 'CW-990' } });
    expect(created.status()).toBe(201);
    spoolId = ((await created.json()) as Spool).id;

    await page.goto(`${app.baseUrl}/spools/${spoolId}`);
    await page.getByRole('button', { name: 'Start laying out' }).click();
    const begin = page.getByRole('form', { name: 'Begin the spool' });
    await begin.getByLabel('Main size').selectOption('14');
    await begin.getByLabel('Start with').selectOption('weld-neck-flange');
    await begin.getByRole('button', { name: 'Begin' }).click();
    await saveScreenshot(page, 'editor-00-begun');

    // East 1900 to the first elbow, elbows welded together (cut 0), west 1900 back.
    await addRun(page, 'e', '1900 mm');
    await addRun(page, 'n', '0', 'Cut length (0 = fittings welded together)');
    await addRun(page, 'w', '1900 mm');
    await page.getByTestId('node-properties').getByLabel('End').selectOption('weld-neck-flange');
    await saveScreenshot(page, 'editor-01-return-built');

    // The 6" set-on branch: pick the first run from the cut list, insert 800 from the flange, up 450.
    await page.locator('[data-testid="cut-list"] tbody tr[data-piece="P1"]').click();
    const insert = page.getByRole('form', { name: 'Insert on this run' });
    await insert.getByLabel('Fitting').selectOption('set-on-branch');
    await insert.getByLabel("Distance from the run's start work point").fill('800 mm');
    await insert.getByLabel('Branch size').selectOption('6');
    await insert.getByRole('radio', { name: /^Up/ }).click();
    await insert.getByLabel('Branch length, centre-to-face').fill('450 mm');
    await insert.getByLabel('Branch end').selectOption('weld-neck-flange');
    await insert.getByRole('button', { name: 'Insert' }).click();
    await page.locator('[data-testid="cut-list"] tbody tr').nth(2).waitFor();
    await waitSaved(page);
    await saveScreenshot(page, 'editor-02-branch-added');

    // Undo and redo by keyboard leave the same cut list.
    const shown = await cutListOnScreen(page);
    await page.locator('body').click({ position: { x: 5, y: 5 } });
    await page.keyboard.press('Control+z');
    await expect.poll(async () => (await cutListOnScreen(page)).length).toBe(2);
    await page.keyboard.press('Control+Shift+z');
    await expect.poll(async () => (await cutListOnScreen(page)).length).toBe(3);
    await waitSaved(page);

    // What the server stored, run through the engine, is exactly what the screen shows.
    const spool = (await (await page.request.get(`${app.baseUrl}/api/spools/${spoolId}`)).json()) as Spool;
    const draft = (await (await page.request.get(`${app.baseUrl}/api/spools/${spoolId}/revisions/${spool.draft!.id}`)).json()) as Revision;
    const result = computeSpool(draft.design, { jobSpec: jobSpecOverrides(job.spec) });
    expect(result.issues.filter((i) => i.severity === 'error')).toEqual([]);
    const onScreen = await cutListOnScreen(page);
    expect(onScreen).toEqual(shown);
    expect(onScreen.map((p) => [p.mark, p.mm, p.text])).toEqual(result.pieces.map((p) => [p.mark, p.cutLengthMm, formatLength(p.cutLengthMm!, job.units)]));
    // And against the tables: header piece through the set-on = 1900 − Y (ASME B16.5 Class 150 WN NPS 14,
    // 127.0 mm incl. raised face, pre-2003 tables) − A (ASME B16.9 LR 90° NPS 14, 533 mm = 21 in, from memory)
    // − two 3 mm root gaps. The job's root gap is used by both sides of this comparison.
    const gap = job.spec.rootGapMm;
    expect(Math.abs(onScreen[0]!.mm - (1900 - 127 - 533 - 2 * gap))).toBeLessThanOrEqual(0.5);
    expect(Math.abs(onScreen[1]!.mm - (1900 - 533 - 127 - 2 * gap))).toBeLessThanOrEqual(0.5);

    // A reload shows the saved spool, not an empty one.
    await page.reload();
    await page.locator('[data-testid="cut-list"] tbody tr').nth(2).waitFor();
    expect(await cutListOnScreen(page)).toEqual(onScreen);
    await waitSaved(page);
    await page.getByRole('tab', { name: /Bolt holes/ }).click();
    await saveScreenshot(page, 'editor-03-bolt-holes');
    await page.getByRole('tab', { name: /Weight/ }).click();
    await page.getByText(/lifts are planned by a competent person/).first().waitFor();
    await page.getByRole('button', { name: 'Plan' }).click();
    await saveScreenshot(page, 'editor-04-plan-weight');
    // A file that is not a spool design is refused with its reason, and nothing changes.
    await page.getByLabel('Design file to import').setInputFiles({ name: 'wrong.json', mimeType: 'application/json', buffer: Buffer.from('{"format":"tackline.spool","version":1,"origin":{"x":0,"y":0,"z":0},"nodes":[],"runs":[]}') });
    await page.getByTestId('editor-status').getByText(/Not a valid spool design: nodes/).waitFor();
    await page.getByRole('tab', { name: /Cut list/ }).click();
    expect(await cutListOnScreen(page)).toEqual(onScreen);
    // The 3D view drew under the policy: a blank or failed WebGL canvas is one colour, a
    // shaded pipe gives many. The screenshot is decoded in the page (img-src allows data:).
    const shot = (await page.locator('canvas').first().screenshot()).toString('base64');
    const colours = await page.evaluate(async (b64) => {
      const img = new Image();
      img.src = `data:image/png;base64,${b64}`;
      await img.decode();
      const c = document.createElement('canvas');
      c.width = img.width;
      c.height = img.height;
      const g = c.getContext('2d')!;
      g.drawImage(img, 0, 0);
      const px = g.getImageData(0, 0, c.width, c.height).data;
      const seen = new Set<number>();
      for (let i = 0; i < px.length; i += 4 * 7) seen.add((px[i]! << 16) | (px[i + 1]! << 8) | px[i + 2]!);
      return seen.size;
    }, shot);
    expect(colours).toBeGreaterThan(20);
    expect(cspViolations).toEqual([]);
    expect(problems).toEqual([]);
    await signOut(page);
    await page.close();
  });

  it('a detailer loses nothing: a save that fails is kept in the browser, and a conflicting save shows both versions', { timeout: 120_000 }, async () => {
    await browser.context.clearCookies();
    const page = await browser.context.newPage();
    page.on('dialog', (d) => void d.accept());
    await page.goto(`${app.baseUrl}/`);
    await signInAs(page, DEMO_USERS.detailer);
    await page.goto(`${app.baseUrl}/spools/${spoolId}`);
    await page.locator('[data-testid="cut-list"] tbody tr').nth(2).waitFor();

    // The keys are listed where anyone can find them.
    await page.locator('body').click({ position: { x: 5, y: 5 } });
    await page.keyboard.press('?');
    const keys = page.getByRole('dialog', { name: 'Editor keys' });
    await keys.getByText('Insert a set-on branch on the selected run').waitFor();
    await saveScreenshot(page, 'editor-09-keys');
    await page.keyboard.press('Escape');
    await keys.waitFor({ state: 'hidden' });

    // The server cannot be reached for the save: the change stays in this browser across a reload.
    await page.route('**/api/spools/*/draft', (route) => (route.request().method() === 'PUT' ? route.abort() : route.continue()));
    await page.locator('[data-testid="cut-list"] tbody tr[data-piece="P2"]').click();
    const heat = page.getByTestId('run-properties').getByLabel('Heat number');
    await heat.fill('H-7731');
    await heat.press('Tab');
    await page.locator('[data-testid="save-status"][data-status="error"]').waitFor({ timeout: 15_000 });
    await page.unroute('**/api/spools/*/draft');
    await page.reload();
    await page.getByText('Restored unsaved changes from this browser').waitFor();
    await waitSaved(page);
    const heatOnScreen = await page.locator('[data-testid="cut-list"] tbody tr[data-piece="P2"] td').last().textContent();
    expect(heatOnScreen).toBe('H-7731');

    // Someone else saves the draft meanwhile (another tab, another detailer).
    const spool = (await (await page.request.get(`${app.baseUrl}/api/spools/${spoolId}`)).json()) as Spool;
    const stored = (await (await page.request.get(`${app.baseUrl}/api/spools/${spoolId}/revisions/${spool.draft!.id}`)).json()) as Revision;
    const theirs = structuredClone(stored.design) as { runs: { length: { mm: number } }[] };
    theirs.runs[0]!.length.mm = 700;
    const other = await page.request.put(`${app.baseUrl}/api/spools/${spoolId}/draft`, { data: { design: theirs, version: stored.version } });
    expect(other.status()).toBe(200);

    // This browser's next change meets the conflict: both versions shown, nothing lost.
    await page.locator('[data-testid="cut-list"] tbody tr[data-piece="P3"]').click();
    const heat3 = page.getByTestId('run-properties').getByLabel('Heat number');
    await heat3.fill('H-5120');
    await heat3.press('Tab');
    const dialog = page.getByRole('dialog', { name: 'Someone else saved this draft' });
    await dialog.waitFor({ timeout: 15_000 });
    await saveScreenshot(page, 'editor-06-conflict');
    await dialog.getByRole('button', { name: 'Keep mine (save over it)' }).click();
    await waitSaved(page);
    const after = (await (await page.request.get(`${app.baseUrl}/api/spools/${spoolId}/revisions/${spool.draft!.id}`)).json()) as Revision;
    const design = after.design as { runs: { length: { mm: number }; heat?: string }[] };
    expect(design.runs[0]!.length.mm).toBe(800);
    expect(design.runs.map((r) => r.heat).filter(Boolean).sort()).toEqual(['H-5120', 'H-7731']);
    await signOut(page);
    await page.close();
  });

  it('a fabricator and a viewer get a read-only editor, and the API refuses their saves', { timeout: 90_000 }, async () => {
    for (const who of ['fabricator', 'viewer'] as const) {
      await browser.context.clearCookies();
      const page = await browser.context.newPage();
      await page.goto(`${app.baseUrl}/`);
      await signInAs(page, DEMO_USERS[who]);
      await page.goto(`${app.baseUrl}/spools/${spoolId}`);
      await page.getByTestId('read-only-banner').waitFor();
      await page.locator('[data-testid="cut-list"] tbody tr').nth(2).waitFor();
      expect(await page.getByTestId('spool-editor').getAttribute('data-read-only')).toBe('true');
      expect(await page.getByRole('form', { name: 'Add a run' }).count()).toBe(0);
      expect(await page.getByRole('button', { name: 'Undo' }).count()).toBe(0);
      // Reading a dimension still works: select a piece and see its properties, not editable.
      await page.locator('[data-testid="cut-list"] tbody tr[data-piece="P2"]').click();
      await expect.poll(() => page.getByTestId('run-properties').getByRole('textbox', { name: 'Length', exact: true }).isDisabled()).toBe(true);
      // Keys that would edit do nothing.
      await page.locator('body').press('Delete');
      expect(await page.locator('[data-testid="cut-list"] tbody tr').count()).toBe(3);
      await saveScreenshot(page, `editor-05-read-only-${who}`);
      if (who === 'fabricator') {
        // Orbit and zoom from the keyboard too: the picture changes with each key.
        const canvas = page.locator('canvas').first();
        await canvas.click({ position: { x: 20, y: 200 } });
        await page.waitForTimeout(500);
        const before = await canvas.screenshot();
        // Still: nothing moves the camera until a key does.
        await page.waitForTimeout(300);
        expect((await canvas.screenshot()).equals(before)).toBe(true);
        await page.keyboard.press('ArrowLeft');
        await page.keyboard.press('ArrowUp');
        await page.keyboard.press('+');
        await expect.poll(async () => (await canvas.screenshot()).equals(before), { timeout: 10_000 }).toBe(false);
        // What they may take away: the design file and a glTF model.
        const [jsonDownload] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Design file' }).click()]);
        const saved = JSON.parse(await streamText(await jsonDownload.createReadStream())) as { format: string; nodes: unknown[] };
        expect(saved.format).toBe('tackline.spool');
        expect(saved.nodes).toHaveLength(6);
        const [glb] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'glTF' }).click()]);
        const bytes = await streamBytes(await glb.createReadStream());
        expect(bytes.subarray(0, 4).toString('latin1')).toBe('glTF');
        // The JSON chunk: plain meshes (no instancing extension) for every piece, weld and fitting.
        const gltf = JSON.parse(bytes.subarray(20, 20 + bytes.readUInt32LE(12)).toString('utf8')) as { nodes: unknown[]; extensionsUsed?: string[] };
        expect(gltf.extensionsUsed ?? []).not.toContain('EXT_mesh_gpu_instancing');
        // 3 pipe pieces + 7 weld beads + 6 work-point markers at least, besides the fittings.
        expect(gltf.nodes.length).toBeGreaterThan(16);
        expect(glb.suggestedFilename()).toBe('CW-990-S01.glb');
        // On a tablet held upright the same screen still works.
        await page.setViewportSize({ width: 820, height: 1180 });
        await saveScreenshot(page, 'editor-08-tablet-fabricator');
      }

      const spool = (await (await page.request.get(`${app.baseUrl}/api/spools/${spoolId}`)).json()) as Spool;
      const put = await page.request.put(`${app.baseUrl}/api/spools/${spoolId}/draft`, {
        data: { design: { format: 'tackline.spool' }, version: spool.draft?.version ?? 1 },
      });
      expect(put.status()).toBe(403);
      await signOut(page);
      await page.close();
    }
  });

  it('a detailer issues the revision from the editor; the issued revision opens read-only', { timeout: 90_000 }, async () => {
    await browser.context.clearCookies();
    const page = await browser.context.newPage();
    await page.goto(`${app.baseUrl}/`);
    await signInAs(page, DEMO_USERS.detailer);
    await page.goto(`${app.baseUrl}/spools/${spoolId}`);
    await page.locator('[data-testid="cut-list"] tbody tr').nth(2).waitFor();
    await page.getByTestId('spool-editor').getByRole('button', { name: /^Issue revision/ }).click();
    const dialog = page.getByRole('dialog', { name: 'Issue this revision' });
    await dialog.getByLabel('What changed (revision note)').fill('First issue for fabrication');
    await dialog.getByRole('button', { name: 'Issue revision' }).click();
    await page.getByText(/Showing issued revision A/).waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('spool-editor').getAttribute('data-read-only')).toBe('true');
    expect(await page.getByRole('form', { name: 'Add a run' }).count()).toBe(0);
    await page.getByRole('button', { name: 'Start the next revision' }).waitFor();
    await saveScreenshot(page, 'editor-07-issued');
    const spool = (await (await page.request.get(`${app.baseUrl}/api/spools/${spoolId}`)).json()) as Spool;
    expect(spool.currentRevision?.letter).toBe('A');
    expect(spool.draft).toBeNull();
    await signOut(page);
    await page.close();
  });
});
