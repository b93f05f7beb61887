/**
 * Browser benchmark of the spool editor (not a test: it prints figures, asserts nothing).
 *
 *   TEST_DATABASE_ADMIN_URL=postgres://postgres@127.0.0.1:<port>/postgres npx tsx tests/bench/editor-browser.ts
 *
 * Needs a built client (`npx vite build`). In headless Chromium (software WebGL), with a
 * spool of about 300 components it measures:
 * - typed dimension → updated cut list, and → next rendered frame of the scene;
 * - frame time while orbiting with the mouse, labels on and off.
 */
import type { Page } from 'playwright-core';
import { startAppServer } from '../e2e/helpers/app-server';
import { launchBrowser } from '../e2e/helpers/browser';
import { DEMO_USERS, signInAs } from '../e2e/helpers/sign-in';
import type { Job } from '../../shared/schemas/job.schema';
import type { Revision } from '../../shared/schemas/revision.schema';
import type { Spool } from '../../shared/schemas/spool.schema';
import { benchmarkDesign } from './editor-bench-design';

const EDITS = 15;

function stats(values: number[]): string {
  const s = [...values].sort((a, b) => a - b);
  const q = (p: number) => s[Math.min(s.length - 1, Math.floor(p * s.length))]!;
  return `median ${q(0.5).toFixed(1)} ms, p90 ${q(0.9).toFixed(1)} ms, max ${s.at(-1)!.toFixed(1)} ms (n=${s.length})`;
}

/**
 * Types the last character of a length into the selected run's box (lengths apply as
 * they are typed) and times that keystroke → cut list text → next rendered frame.
 */
async function timeEdit(page: Page, mm: number): Promise<{ cutList: number; frame: number }> {
  const box = page.getByTestId('run-properties').getByRole('textbox', { name: 'Length', exact: true });
  const text = String(mm);
  await box.fill(text.slice(0, -1));
  await page.waitForTimeout(150);
  return box.evaluate(
    (input, value) =>
      new Promise<{ cutList: number; frame: number }>((resolve) => {
        const stats = window.__tacklineSceneStats!;
        const framesBefore = stats.frames;
        const cellNow = () => document.querySelector('[data-testid="cut-list"] tbody tr[data-piece="P1"] [data-cut-mm]') as HTMLElement;
        const before = cellNow().dataset.cutMm;
        const t0 = performance.now();
        let cutAt = 0;
        // What a keystroke does to a React-controlled input: the value, then an input event.
        const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value')!.set!;
        setter.call(input, value);
        input.dispatchEvent(new Event('input', { bubbles: true }));
        if (cellNow().dataset.cutMm !== before) cutAt = performance.now();
        const poll = () => {
          const now = performance.now();
          if (!cutAt && cellNow().dataset.cutMm !== before) cutAt = now;
          if (cutAt && stats.frames > framesBefore) resolve({ cutList: cutAt - t0, frame: stats.lastFrameAt - t0 });
          else if (now - t0 > 10_000) resolve({ cutList: Number.NaN, frame: Number.NaN });
          else requestAnimationFrame(poll);
        };
        requestAnimationFrame(poll);
      }),
    text,
  );
}

/** Drags across the canvas for `ms` and reports the mean interval between rendered frames. */
async function timeOrbit(page: Page, ms = 3000): Promise<{ frames: number; meanFrameMs: number; drawCalls: number; triangles: number }> {
  const canvas = page.locator('canvas').first();
  const box = (await canvas.boundingBox())!;
  const cx = box.x + box.width / 2;
  const cy = box.y + box.height / 2;
  const start = await page.evaluate(() => ({ frames: window.__tacklineSceneStats!.frames, t: performance.now() }));
  await page.mouse.move(cx, cy);
  await page.mouse.down();
  const t0 = Date.now();
  let step = 0;
  while (Date.now() - t0 < ms) {
    step++;
    await page.mouse.move(cx + Math.sin(step / 10) * box.width * 0.3, cy + Math.cos(step / 13) * box.height * 0.15);
  }
  await page.mouse.up();
  const end = await page.evaluate(() => ({ ...window.__tacklineSceneStats!, t: performance.now() }));
  const frames = end.frames - start.frames;
  return { frames, meanFrameMs: (end.lastFrameAt - start.t) / Math.max(1, frames), drawCalls: end.drawCalls, triangles: end.triangles };
}

async function main(): Promise<void> {
  const app = await startAppServer();
  const browser = await launchBrowser({ width: 1440, height: 1000 });
  try {
    const page = await browser.context.newPage();
    // tsx keeps function names with a `__name` helper that the page does not have.
    await page.addInitScript({ content: 'window.__name = (f) => f;' });
    await page.goto(`${app.baseUrl}/`);
    await signInAs(page, DEMO_USERS.detailer);
    const jobs = (await (await page.request.get(`${app.baseUrl}/api/jobs`)).json()) as { items: Job[] };
    const job = jobs.items.find((j) => j.number === 'HFD-B-CW')!;
    const spool = (await (await page.request.post(`${app.baseUrl}/api/jobs/${job.id}/spools`, { data: { mark: 'BENCH-300', lineNumber: 'BENCH' } })).json()) as Spool;
    const draft = (await (await page.request.post(`${app.baseUrl}/api/spools/${spool.id}/draft`, { data: {} })).json()) as Revision;
    const design = benchmarkDesign(300);
    const put = await page.request.put(`${app.baseUrl}/api/spools/${spool.id}/draft`, { data: { design, version: draft.version } });
    if (!put.ok()) throw new Error(`saving the benchmark design failed: ${put.status()} ${await put.text()}`);
    console.log(`design: ${design.nodes.length} components, ${design.runs.length} runs`);

    const tLoad = Date.now();
    await page.goto(`${app.baseUrl}/spools/${spool.id}?sceneStats=1`);
    await page.locator('[data-testid="cut-list"] tbody tr[data-piece="P1"]').waitFor({ timeout: 60_000 });
    await page.waitForFunction(() => (window.__tacklineSceneStats?.frames ?? 0) > 0, undefined, { timeout: 60_000 });
    console.log(`open spool page → cut list and first frame: ${Date.now() - tLoad} ms`);
    const pieces = await page.locator('[data-testid="cut-list"] tbody tr').count();
    console.log(`cut list rows: ${pieces}`);

    await page.locator('[data-testid="cut-list"] tbody tr[data-piece="P1"]').click();
    const cut: number[] = [];
    const frame: number[] = [];
    for (let i = 0; i < EDITS; i++) {
      const r = await timeEdit(page, 2000 + (i % 2) * 25 + i);
      cut.push(r.cutList);
      frame.push(r.frame);
    }
    console.log(`typed dimension → cut list updated: ${stats(cut)}`);
    console.log(`typed dimension → scene frame rendered: ${stats(frame)}`);

    // Orbit with every label on, then with labels off (key L).
    await page.getByRole('tab', { name: /Cut list/ }).click();
    const on = await timeOrbit(page);
    console.log(`orbit, labels on: ${on.frames} frames, mean ${on.meanFrameMs.toFixed(1)} ms/frame (${(1000 / on.meanFrameMs).toFixed(1)} fps), ${on.drawCalls} draw calls, ${on.triangles} triangles`);
    await page.locator('body').click({ position: { x: 5, y: 5 } });
    await page.keyboard.press('l');
    const off = await timeOrbit(page);
    console.log(`orbit, labels off: ${off.frames} frames, mean ${off.meanFrameMs.toFixed(1)} ms/frame (${(1000 / off.meanFrameMs).toFixed(1)} fps)`);
  } finally {
    await browser.close();
    await app.stop();
  }
}

main().catch((e) => {
  console.error(e);
  process.exitCode = 1;
});
