import { afterAll, beforeAll, describe, expect, it, onTestFailed } from 'vitest';
import { startAppServer, type RunningApp } from './helpers/app-server';
import { launchBrowser, type TestBrowser } from './helpers/browser';
import { saveScreenshot } from './helpers/screenshots';
import type { Page } from 'playwright-core';
import { DEMO_ORGANISATIONS, DEMO_PASSWORD } from '../../server/db/seed/demo-data';
import { DEMO_USERS, signInAs, signOut } from './helpers/sign-in';

// The demo job as the seed defines it, so the test follows the demo data rather than copying it.
const demoJob = DEMO_ORGANISATIONS[0]!.jobs[0]!;
const DEMO_JOB = demoJob.job.number;
const demoMarks = demoJob.spools.map((s) => s.mark).sort();
const FIRST_MARK = demoMarks[0]!;
const LAST_MARK = demoMarks[demoMarks.length - 1]!;
// Two different demo spools: one the viewer reads, one the detailer issues.
const READ_MARK = demoMarks[1]!;
const ISSUE_MARK = demoMarks[2]!;

/**
 * The first journeys a shop makes: a detailer sets up a job and its first spool;
 * a client viewer reads the same job without any way to change it.
 */
/** On a failure, keep a picture of the page as it was, to see why. */
function keepPictureOnFailure(page: Page, name: string): void {
  onTestFailed(async () => {
    await saveScreenshot(page, `failed-${name}`).catch(() => undefined);
  });
}

describe('jobs and spools in the browser', () => {
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

  it('a detailer signs in, creates a job, adds a spool and sees it in the job’s table', { timeout: 90_000 }, async () => {
    const page = await browser.freshPage();
    keepPictureOnFailure(page, 'detailer');
    const problems: string[] = [];
    page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
    page.on('console', (m) => {
      // 401 (signed out), 404 and 409 (the duplicate mark below) are answers the page handles.
      if (m.type() === 'error' && !/status of 40[149]/.test(m.text())) problems.push(`console: ${m.text()}`);
    });

    await page.goto(`${app.baseUrl}/`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await saveScreenshot(page, '01-sign-in');

    // A wrong password gets the server's one answer, and the form stays usable.
    await page.getByLabel('E-mail').fill(DEMO_USERS.detailer);
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').filter({ hasText: /incorrect/i }).waitFor();
    await saveScreenshot(page, '02-sign-in-refused');

    await signInAs(page, DEMO_USERS.detailer);
    await page.getByRole('heading', { name: 'Jobs', exact: true }).waitFor();
    await page.getByRole('link', { name: DEMO_JOB }).waitFor();
    await saveScreenshot(page, '03-jobs-detailer');

    // New job: the dialog validates with the shared schema before anything is sent.
    await page.getByRole('button', { name: 'New job' }).first().click();
    const dialog = page.getByRole('dialog', { name: 'New job' });
    await dialog.waitFor();
    await dialog.getByRole('button', { name: 'Create job' }).click();
    await dialog.getByLabel('Job number').and(page.locator('[aria-invalid="true"]')).waitFor();
    await saveScreenshot(page, '04-new-job-invalid');

    await dialog.getByLabel('Job number').fill('HFD-C-CHW');
    await dialog.getByLabel('Title').fill('Chilled water, Hall C');
    await dialog.getByLabel('Client').fill('Harrow Fields Data Centre');
    await dialog.getByLabel('Site').fill('Hall C');
    await dialog.getByLabel('Units on screens and sheets').selectOption('ft-in');
    // In a feet-inches job lengths are typed as the tape reads; the millimetres are echoed back.
    await dialog.getByLabel('Root gap').fill('1/16"');
    await dialog.getByText('= 1.6 mm').waitFor();
    await saveScreenshot(page, '05-new-job-filled');
    await dialog.getByRole('button', { name: 'Create job' }).click();

    // Lands on the new job: header, spec in the job's units, and an empty spool table.
    await page.getByRole('heading', { name: /HFD-C-CHW/ }).waitFor();
    expect(page.url()).toMatch(/\/jobs\/[0-9a-f-]{36}$/);
    await page.getByText('No spools in this job yet').waitFor();
    // 1/16" is stored as 1.5875 mm; the job shows it in its units with the millimetres beside it.
    await page.getByText('1/16" (1.6 mm)').waitFor();
    await saveScreenshot(page, '06-job-empty');

    // Someone else saves the job while this detailer is editing it: 409, the entries stay, reload, save again.
    const jobId = page.url().split('/').pop()!;
    await page.getByRole('button', { name: 'Edit job' }).click();
    const editDialog = page.getByRole('dialog', { name: /Edit job/ });
    await editDialog.getByLabel('Title').fill('Chilled water, Hall C, level 2');
    const current = (await (await page.request.get(`${app.baseUrl}/api/jobs/${jobId}`)).json()) as { version: number };
    const other = await page.request.patch(`${app.baseUrl}/api/jobs/${jobId}`, {
      data: { site: 'Hall C east', version: current.version },
    });
    expect(other.status()).toBe(200);
    await editDialog.getByRole('button', { name: 'Save changes' }).click();
    await editDialog.getByText(/Someone else changed this job/).waitFor();
    await expect(editDialog.getByLabel('Title').inputValue()).resolves.toBe('Chilled water, Hall C, level 2');
    await saveScreenshot(page, '06b-job-edit-stale');
    await editDialog.getByRole('button', { name: 'Load latest version' }).click();
    await editDialog.getByText(/Someone else changed this job/).waitFor({ state: 'detached' });
    // Their site change comes in; this user's title stays.
    await expect(editDialog.getByLabel('Site').inputValue()).resolves.toBe('Hall C east');
    await expect(editDialog.getByLabel('Title').inputValue()).resolves.toBe('Chilled water, Hall C, level 2');
    await editDialog.getByRole('button', { name: 'Save changes' }).click();
    await editDialog.waitFor({ state: 'hidden' });
    await page.getByRole('heading', { name: /Chilled water, Hall C, level 2/ }).waitFor();
    await page.getByText('Hall C east').waitFor();

    await page.getByRole('button', { name: 'New spool' }).first().click();
    const spoolDialog = page.getByRole('dialog', { name: /New spool/ });
    await spoolDialog.getByLabel('Spool mark').fill('CHW-110-S01');
    await spoolDialog.getByLabel('Line number').fill('CHW-110');
    await spoolDialog.getByRole('button', { name: 'Add spool' }).click();
    await spoolDialog.waitFor({ state: 'hidden' });

    const row = page.getByRole('row').filter({ hasText: 'CHW-110-S01' });
    await row.waitFor();
    await expect(row.textContent()).resolves.toMatch(/CHW-110.*In drafting/);
    await saveScreenshot(page, '07-job-with-spool');

    // The same mark twice is refused with a message on the field, and the dialog keeps the input.
    await page.getByRole('button', { name: 'New spool' }).first().click();
    await spoolDialog.getByLabel('Spool mark').fill('CHW-110-S01');
    await spoolDialog.getByLabel('Line number').fill('CHW-110');
    await spoolDialog.getByRole('button', { name: 'Add spool' }).click();
    await spoolDialog.getByText(/already/i).waitFor();
    await expect(spoolDialog.getByLabel('Spool mark').inputValue()).resolves.toBe('CHW-110-S01');
    await saveScreenshot(page, '08-duplicate-spool');
    await spoolDialog.getByRole('button', { name: 'Cancel' }).click();
    await spoolDialog.waitFor({ state: 'hidden' });

    await row.getByRole('link', { name: 'CHW-110-S01' }).click();
    await page.getByRole('heading', { name: 'CHW-110-S01' }).waitFor();
    await page.getByRole('heading', { name: 'Revisions' }).waitFor();
    await page.getByRole('complementary', { name: 'Before lifting, welding or testing' }).getByText(/competent person/).waitFor();
    await page.getByText('Loading the editor…').waitFor({ state: 'detached' });
    await saveScreenshot(page, '09-spool-detailer');

    await signOut(page);
    expect(problems, problems.join('\n')).toEqual([]);
    await page.close();
  });

  it('a viewer sees the jobs and spools but no button that changes them', { timeout: 60_000 }, async () => {
    const page = await browser.freshPage();
    keepPictureOnFailure(page, 'viewer');
    // Signed out, a deep link goes to sign-in and comes back afterwards.
    await page.goto(`${app.baseUrl}/users`);
    await page.waitForURL(/\/sign-in\?next=%2Fusers/);
    await signInAs(page, DEMO_USERS.viewer);
    await page.waitForURL(/\/users$/);
    await page.getByRole('heading', { name: 'Admins only' }).waitFor();

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Jobs' }).click();
    await page.getByRole('link', { name: DEMO_JOB }).waitFor();
    await expect(page.getByRole('button', { name: 'New job' }).count()).resolves.toBe(0);
    await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Users' }).count()).resolves.toBe(0);
    await saveScreenshot(page, '10-jobs-viewer');

    await page.getByRole('link', { name: DEMO_JOB }).click();
    await page.getByRole('row').filter({ hasText: READ_MARK }).waitFor();
    await expect(page.getByRole('button', { name: 'New spool' }).count()).resolves.toBe(0);
    await expect(page.getByRole('button', { name: 'Edit job' }).count()).resolves.toBe(0);
    await saveScreenshot(page, '11-job-viewer');

    // Sorting by mark, descending, reorders the rows and is kept in the URL.
    await page.getByRole('button', { name: 'Spool mark' }).click();
    await page.waitForURL(/sort=mark&order=desc/);
    await page.locator('tbody tr').first().filter({ hasText: LAST_MARK }).waitFor();
    await expect(page.locator('tbody tr').last().locator('td').first().textContent()).resolves.toBe(FIRST_MARK);

    await page.getByRole('link', { name: READ_MARK }).click();
    await page.getByRole('heading', { name: READ_MARK }).waitFor();
    await page.getByRole('heading', { name: 'Revisions' }).waitFor();
    for (const name of [/Edit mark/, /Archive/, /Start/, /Issue revision/, /Record as /]) {
      await expect(page.getByRole('button', { name }).count()).resolves.toBe(0);
    }
    await page.getByText('Loading the editor…').waitFor({ state: 'detached' });
    await page.getByRole('button', { name: 'Open sheet (PDF)' }).waitFor();
    await saveScreenshot(page, '12-spool-viewer');
    // The sheet is for every role; the link the page builds answers with a PDF.
    const spoolId = page.url().split('/').pop()!;
    const sheet = await page.request.get(`${app.baseUrl}/api/spools/${spoolId}/sheet.pdf?paper=A4`);
    expect(sheet.status(), await sheet.text()).toBe(200);
    expect(sheet.headers()['content-type']).toBe('application/pdf');

    // The session ends mid-work (expired, or signed out elsewhere): the next request sends
    // the user to sign-in, and signing in brings them back to where they were going.
    await page.getByRole('navigation', { name: 'Breadcrumb' }).getByRole('link', { name: DEMO_JOB }).click();
    await page.getByRole('row').filter({ hasText: READ_MARK }).waitFor();
    await browser.context.clearCookies();
    await page.getByRole('button', { name: 'Line' }).click();
    await page.waitForURL(/\/sign-in\?next=%2Fjobs%2F.*sort%3DlineNumber/);
    await signInAs(page, DEMO_USERS.viewer);
    await page.waitForURL(/\/jobs\/[0-9a-f-]{36}\?sort=lineNumber&order=asc$/);
    await page.getByRole('row').filter({ hasText: READ_MARK }).waitFor();
    await page.close();
  });

  it('a detailer issues a revision and a fabricator records the cut', { timeout: 60_000 }, async () => {
    const page = await browser.freshPage();
    keepPictureOnFailure(page, 'issue');
    await page.goto(`${app.baseUrl}/`);
    await signInAs(page, DEMO_USERS.detailer);
    await page.getByRole('link', { name: DEMO_JOB }).click();
    await page.getByRole('link', { name: ISSUE_MARK }).click();
    // Issuing happens in the editor, beside the design and its checks.
    await page.getByRole('button', { name: 'Issue revision A' }).click();
    const dialog = page.getByRole('dialog', { name: 'Issue this revision' });
    await dialog.getByLabel(/What changed/).fill('Issued for fabrication');
    await dialog.getByRole('button', { name: 'Issue revision' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await page.getByText('Issued to bay').first().waitFor();
    await page.getByRole('row').filter({ hasText: 'Issued for fabrication' }).filter({ hasText: 'Current issue' }).waitFor();
    await saveScreenshot(page, '17-spool-issued');
    const spoolUrl = page.url();
    await signOut(page);

    await page.goto(spoolUrl);
    await signInAs(page, DEMO_USERS.fabricator);
    await page.getByRole('heading', { name: ISSUE_MARK }).waitFor();
    // A fabricator records shop progress only: no design or archive controls.
    await expect(page.getByRole('button', { name: /Issue revision|Start|Edit mark|Archive/ }).count()).resolves.toBe(0);
    await page.getByText('Loading the editor…').waitFor({ state: 'detached' });
    await saveScreenshot(page, '18-spool-fabricator');
    await page.getByRole('button', { name: 'Record as cut' }).click();
    const confirm = page.getByRole('dialog', { name: `Record ${ISSUE_MARK} as Cut?` });
    await saveScreenshot(page, '18b-confirm-cut');
    await confirm.getByRole('button', { name: 'Record as cut' }).click();
    await confirm.waitFor({ state: 'hidden' });
    await page.getByRole('button', { name: 'Record as fitted up' }).waitFor();
    await page.getByText('Cut', { exact: true }).first().waitFor();
    await saveScreenshot(page, '19-spool-cut');

    // The foreman's question, "what is cut?": the job's table filtered by status.
    await page.getByRole('navigation', { name: 'Breadcrumb' }).getByRole('link', { name: DEMO_JOB }).click();
    await page.getByLabel('Status', { exact: true }).selectOption('cut');
    await page.waitForURL(/status=cut/);
    await page.locator('tbody tr').first().filter({ hasText: ISSUE_MARK }).waitFor();
    await expect(page.locator('tbody tr').count()).resolves.toBe(1);
    await page.close();
  });

  it('an admin manages users, and the job reads well at tablet width', { timeout: 60_000 }, async () => {
    const page = await browser.freshPage();
    keepPictureOnFailure(page, 'admin');
    await page.goto(`${app.baseUrl}/sign-in`);
    await signInAs(page, DEMO_USERS.admin);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Users' }).click();
    await page.getByRole('row').filter({ hasText: 'Anselm Tarrow' }).waitFor();
    await saveScreenshot(page, '13-users-admin');

    // A new fabricator joins: added with a first password, listed at once.
    await page.getByRole('button', { name: 'Add user' }).click();
    const addUser = page.getByRole('dialog', { name: 'Add a user' });
    await addUser.getByLabel('Name').fill('Tamsin Oakridge');
    await addUser.getByLabel('E-mail').fill('tamsin@kestrel.example');
    await addUser.getByLabel('First password').fill('short');
    await addUser.getByRole('button', { name: 'Add user' }).click();
    await addUser.getByText('Use at least 10 characters').waitFor();
    await addUser.getByLabel('First password').fill('bevel-and-land-2026');
    // Account changes ask for the admin's own password again; a wrong one changes nothing.
    await addUser.getByLabel('Your password').fill('not-the-admin-password');
    await addUser.getByRole('button', { name: 'Add user' }).click();
    await addUser.getByText('That is not your password').waitFor();
    await addUser.getByLabel('Your password').fill(DEMO_PASSWORD);
    await addUser.getByRole('button', { name: 'Add user' }).click();
    await addUser.waitFor({ state: 'hidden' });
    const tamsin = page.getByRole('row').filter({ hasText: 'Tamsin Oakridge' });
    await tamsin.filter({ hasText: 'tamsin@kestrel.example' }).waitFor();

    // Role changes and deactivation are confirmed first, then show in the row.
    await tamsin.getByLabel('Role of Tamsin Oakridge').selectOption('inspector');
    const confirmRole = page.getByRole('dialog', { name: 'Make Tamsin Oakridge inspector?' });
    await confirmRole.getByLabel('Your password').fill(DEMO_PASSWORD);
    await confirmRole.getByRole('button', { name: 'Change role' }).click();
    await confirmRole.waitFor({ state: 'hidden' });
    await expect(tamsin.getByLabel('Role of Tamsin Oakridge').inputValue()).resolves.toBe('inspector');
    await tamsin.getByRole('button', { name: 'Deactivate' }).click();
    const confirmOff = page.getByRole('dialog', { name: 'Deactivate Tamsin Oakridge?' });
    await confirmOff.getByLabel('Your password').fill(DEMO_PASSWORD);
    await confirmOff.getByRole('button', { name: 'Deactivate' }).click();
    await tamsin.getByText('Deactivated').waitFor();
    await tamsin.getByRole('button', { name: 'Reactivate' }).waitFor();

    // Archiving takes a job out of the default list; the "Archived" filter still finds it.
    const created = await page.request.post(`${app.baseUrl}/api/jobs`, {
      data: {
        number: 'HFD-X-TEMP',
        title: 'Temporary works',
        client: 'Harrow Fields Data Centre',
        spec: { material: 'ASTM A106 Gr B', schedule: 'STD', flangeClass: 150, rootGapMm: 3, sawKerfMm: 3, minPieceLengthMm: 50 },
      },
    });
    expect(created.status()).toBe(201);
    const { id: tempId } = (await created.json()) as { id: string };
    await page.goto(`${app.baseUrl}/jobs/${tempId}`);
    await page.getByRole('button', { name: 'Archive' }).click();
    await page.getByRole('dialog', { name: /Archive job HFD-X-TEMP/ }).getByRole('button', { name: 'Archive job' }).click();
    await page.getByText('Archived', { exact: true }).first().waitFor();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Jobs' }).click();
    await page.getByRole('link', { name: DEMO_JOB }).waitFor();
    await expect(page.getByRole('link', { name: 'HFD-X-TEMP' }).count()).resolves.toBe(0);
    await page.getByLabel('Show').selectOption('archived');
    await page.getByRole('link', { name: 'HFD-X-TEMP' }).waitFor();
    await saveScreenshot(page, '13b-jobs-archived-filter');

    await page.setViewportSize({ width: 820, height: 1180 });
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Jobs' }).click();
    await page.getByRole('link', { name: DEMO_JOB }).click();
    await page.getByRole('row').filter({ hasText: READ_MARK }).waitFor();
    await saveScreenshot(page, '14-job-tablet');
    await page.getByRole('link', { name: READ_MARK }).click();
    await page.getByRole('heading', { name: 'Revisions' }).waitFor();
    await saveScreenshot(page, '15-spool-admin-tablet');

    await page.goto(`${app.baseUrl}/no-such-page`);
    await page.getByRole('heading', { name: 'No such page' }).waitFor();
    await saveScreenshot(page, '16-not-found');
    // A record id that does not exist (or belongs to another shop), or is not an id at all.
    await page.goto(`${app.baseUrl}/spools/7f1d2c3b-0000-4000-8000-000000000000`);
    await page.getByRole('heading', { name: 'No such spool' }).waitFor();
    await page.goto(`${app.baseUrl}/jobs/not-an-id`);
    await page.getByRole('heading', { name: 'No such job' }).waitFor();
    await page.close();
  });
});
