/**
 * Trade-study review in headless Chromium against the real API, worker and database: a small grid
 * study (made through the API) runs to completion; on its page the engineer submits it for review,
 * the lead (a second browser) sends it back with a reason, then approves it after resubmission;
 * the reviewer (a third browser) sees no review control but comments on one case and on the study;
 * the printable study report shows the approval, the comment, the caution line and a drawn chart,
 * and prints without the app's chrome. Last, the run review report prints its charts.
 * Screenshots go to test-artifacts/e2e/study-review-*.png (and the PDFs next to them).
 */
import path from 'node:path';
import { readFileSync, statSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { artifactsDir, openBrowser } from './browser';
import { canvasContent, demoUsers, signIn, type DemoRole } from './page-helpers';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');
const shot = (page: Page, name: string) => page.screenshot({ path: path.join(artifactsDir, `study-review-${name}.png`), fullPage: true });



/** A tiny JSON client of the API with its own session cookie. */
function apiClient() {
  let cookie = '';
  return async function api<T = Record<string, unknown>>(method: string, url: string, body?: unknown): Promise<T> {
    const response = await fetch(`${inject('baseUrl')}${url}`, {
      method,
      headers: { 'content-type': 'application/json', cookie },
      ...(body === undefined ? {} : { body: JSON.stringify(body) }),
    });
    const setCookie = response.headers.get('set-cookie');
    if (setCookie) cookie = setCookie.split(';')[0]!;
    const text = await response.text();
    if (!response.ok) throw new Error(`${method} ${url}: ${response.status} ${text}`);
    return (text ? JSON.parse(text) : null) as T;
  };
}


const reviewButtons = ['Submit for review', 'Submit again for review', 'Approve and freeze', 'Send back…', 'Send back with this reason', 'Cancel study'];

describe('trade-study review: submit, send back, approve; reviewer comments; printable report', () => {
  const browsers: Awaited<ReturnType<typeof openBrowser>>[] = [];
  const pages = {} as Record<DemoRole, Page>;
  const tag = randomUUID().slice(0, 6);
  const studyName = `Review grid ${tag}`;
  const reason = `Add the heavier bus to the note (${tag}).`;
  const caseComment = `Case 1 looks light on wing area (${tag}).`;
  const studyComment = `Reviewed the grid; margins read well (${tag}).`;
  let missionId = '';
  let studyId = '';
  let runId = '';
  let studyUrl = '';

  beforeAll(async () => {
    const api = apiClient();
    await api('POST', '/api/auth/login', { email: demoUsers.engineer[0], password: demoUsers.engineer[1] });
    const { missions } = await api<{ missions: { id: string; name: string }[] }>('GET', '/api/missions');
    missionId = missions.find((m) => m.name === 'Corvina-2')!.id;
    const spec = JSON.parse(readFileSync(path.join(repoRoot, 'fixtures/vehicles/corvina-2.vehicle.json'), 'utf8')) as unknown;
    const saved = await api<{ revision: { id: string } }>('POST', `/api/missions/${missionId}/vehicles`, { name: `Review box-wing ${tag}`, spec });
    const scenario = JSON.parse(readFileSync(path.join(repoRoot, 'fixtures/scenarios/corvina-2-geo-30d.scenario.json'), 'utf8')) as Record<string, unknown>;
    delete scenario.requirements;
    Object.assign(scenario, { name: `Review quarter day ${tag}`, vehicle: { ref: saved.revision.id }, spanDays: 0.25, outputStepS: 900 });
    const created = await api<{ id: string }>('POST', `/api/missions/${missionId}/scenarios`, { name: scenario.name, spec: scenario });
    const study = await api<{ id: string }>('POST', `/api/missions/${missionId}/studies`, {
      name: studyName,
      scenarioId: created.id,
      lines: ['srp.accel.mean', 'srp.deltaV.total'],
      design: { kind: 'grid', parameters: [{ path: 'vehicle.massKg', values: [3000, 5400] }, { path: 'vehicle.plates.1.areaM2', values: [10, 14] }] },
    });
    studyId = study.id;
    runId = (await api<{ id: string }>('POST', `/api/missions/${missionId}/runs`, { scenarioId: created.id })).id;
    studyUrl = `${inject('baseUrl')}/missions/${missionId}/studies/${studyId}`;

    for (const role of ['engineer', 'lead', 'reviewer'] as const) {
      const browser = await openBrowser();
      browsers.push(browser);
      pages[role] = await browser.context.newPage();
      await signIn(pages[role], role);
    }
    // The study finishes (4 cases of a quarter day on the in-process worker).
    const deadline = Date.now() + 60_000;
    for (;;) {
      const s = await api<{ status: string; progress: { succeeded: number } }>('GET', `/api/missions/${missionId}/studies/${studyId}`);
      if (s.status === 'finished') {
        expect(s.progress.succeeded).toBe(4);
        break;
      }
      if (Date.now() > deadline) throw new Error(`study still ${s.status} after 60 s`);
      await new Promise((r) => setTimeout(r, 500));
    }
  });
  afterAll(async () => {
    for (const b of browsers) await b.close();
  });

  it('the engineer submits the finished study for review', async () => {
    const page = pages.engineer;
    await page.goto(studyUrl);
    await page.getByRole('heading', { name: studyName }).waitFor();
    await page.getByText('4 / 4 cases done').waitFor();
    const review = page.getByRole('region', { name: 'Review', exact: true });
    await review.getByText('Not submitted for review yet.').waitFor();
    expect(await review.getByRole('button', { name: 'Approve and freeze' }).count(), 'engineers do not approve').toBe(0);
    await review.getByRole('button', { name: 'Submit for review' }).click();
    await review.getByText('In review').first().waitFor();
    expect(await review.getByRole('button', { name: 'Submit for review' }).count()).toBe(0);
    await shot(page, '1-engineer-submitted');
  });

  it('the lead sends it back with a reason (checked at the field first)', async () => {
    const page = pages.lead;
    await page.goto(studyUrl);
    const review = page.getByRole('region', { name: 'Review', exact: true });
    await review.getByText('In review').first().waitFor();
    await review.getByRole('button', { name: 'Send back…' }).click();
    await review.getByRole('button', { name: 'Send back with this reason' }).click();
    await review.getByText(/reason is required/).waitFor();
    expect(await review.getByLabel('Reason for sending back (required)').getAttribute('aria-invalid')).toBe('true');
    await review.getByLabel('Reason for sending back (required)').fill(reason);
    await review.getByRole('button', { name: 'Send back with this reason' }).click();
    await review.getByText('Changes requested').first().waitFor();
    await review.getByText(reason).first().waitFor();
    await shot(page, '2-lead-sent-back');
  });

  it('the engineer resubmits and the lead approves; the hash is shown and matches', async () => {
    const engineer = pages.engineer;
    await engineer.reload();
    const mine = engineer.getByRole('region', { name: 'Review', exact: true });
    await mine.getByText(reason).first().waitFor();
    await mine.getByRole('button', { name: 'Submit again for review' }).click();
    await mine.getByText('In review').first().waitFor();

    const lead = pages.lead;
    await lead.reload();
    const review = lead.getByRole('region', { name: 'Review', exact: true });
    await review.getByRole('button', { name: 'Approve and freeze' }).click();
    await review.getByText('Approved', { exact: true }).first().waitFor();
    await review.getByText('content matches the approved hash').waitFor();
    expect(await review.getByText(/SHA-256 [0-9a-f]{64}/).count()).toBeGreaterThanOrEqual(1);
    await review.getByText('History of this review').click();
    await review.getByRole('list', { name: 'Review history' }).getByText('Sent back').waitFor();
    expect(await review.getByRole('list', { name: 'Review history' }).getByRole('listitem').count()).toBe(4);
    await shot(lead, '3-lead-approved');
  });

  it('the reviewer sees no review control and comments on the study, mentioning the engineer', async () => {
    const page = pages.reviewer;
    await page.goto(studyUrl);
    await page.getByRole('region', { name: 'Review', exact: true }).getByText('Approved', { exact: true }).first().waitFor();
    for (const name of reviewButtons) expect(await page.getByRole('button', { name, exact: true }).count(), `${name} for a reviewer`).toBe(0);
    const comments = page.getByRole('region', { name: 'Comments on the study' });
    await comments.getByLabel('New comment').fill(`${studyComment} @ines.okafor`);
    await comments.getByRole('button', { name: 'Post comment' }).click();
    await comments.getByRole('listitem').getByText(/Mentions: Ines Okafor/).waitFor();
  });

  it('the reviewer opens a case from the table and comments on that case', async () => {
    const page = pages.reviewer;
    await page.getByRole('button', { name: 'Open case 1' }).click();
    const detail = page.getByRole('region', { name: 'Case #1' });
    await detail.getByText('vehicle.massKg').waitFor();
    expect(await detail.innerText()).toMatch(/Budget lines/);
    await detail.getByLabel('New comment').fill(caseComment, { timeout: 5000 });
    await detail.getByRole('button', { name: 'Post comment' }).click();
    await detail.getByRole('listitem').getByText(caseComment).waitFor();
    expect(await detail.getByLabel('New comment').inputValue(), 'the composer is cleared once posted').toBe('');
    // Stored on the case itself, not on the study.
    expect(await page.getByRole('region', { name: 'Comments on the study' }).getByText(caseComment).count()).toBe(0);
    await shot(page, '4-reviewer-comments');
  });

  it('the printable study report shows the approval, the comment, the caution line and a drawn chart, and prints without chrome', async () => {
    const page = pages.reviewer;
    await page.getByRole('link', { name: 'Printable report' }).first().click();
    await page.waitForURL(/\/studies\/[0-9a-f-]{36}\/report$/);
    await page.getByRole('heading', { name: 'Approval' }).waitFor();
    const report = page.locator('article.report');
    await report.getByText(studyComment).waitFor();
    const scatter = '[role="img"][aria-label^="Scatter of"]';
    await page.locator(`${scatter} canvas`).first().waitFor();
    await page.waitForTimeout(500);
    const text = await report.innerText();
    expect(text).toMatch(/State\s+Approved/);
    expect(text).toMatch(/Content SHA-256\s+[0-9a-f]{64}/);
    expect(text).toContain(reason);
    expect(text).toMatch(/analysis aid/);
    const content = await canvasContent(page, scatter);
    expect(content.width).toBeGreaterThan(300);
    expect(content.width, 'the chart fits an A4 page (≈ 688 CSS px wide)').toBeLessThanOrEqual(688);
    expect(content.colours, 'the chart canvas is not one flat colour').toBeGreaterThan(5);
    expect(content.drawnShare).toBeGreaterThan(0.002);
    await shot(page, '5-report-screen');

    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('body > div header').first().isVisible(), 'app header hidden in print').toBe(false);
    expect(await page.getByRole('button', { name: 'Print…' }).isVisible()).toBe(false);
    expect(await page.getByRole('link', { name: 'Back to the study' }).isVisible()).toBe(false);
    expect(await page.locator(scatter).first().isVisible(), 'charts print').toBe(true);
    await shot(page, '6-report-print');
    const pdf = path.join(artifactsDir, 'study-review-report.pdf');
    await page.pdf({ path: pdf, format: 'A4', printBackground: true });
    expect(statSync(pdf).size).toBeGreaterThan(20_000);
    await page.emulateMedia({ media: 'screen' });
  });

  it('the run review report prints its charts', async () => {
    const page = pages.lead;
    await page.goto(`${inject('baseUrl')}/missions/${missionId}/runs/${runId}/report`);
    await page.getByRole('heading', { name: 'Charts' }).waitFor({ timeout: 45_000 });
    await page.getByRole('img', { name: /^SRP acceleration components/ }).waitFor({ timeout: 20_000 });
    await page.waitForTimeout(500);
    await page.emulateMedia({ media: 'print' });
    const content = await canvasContent(page, '[aria-label^="SRP acceleration components"]');
    expect(content.width).toBeLessThanOrEqual(688);
    expect(content.colours).toBeGreaterThan(5);
    expect(await page.locator('body > div header').first().isVisible()).toBe(false);
    await shot(page, '7-run-report-print');
  });
});
