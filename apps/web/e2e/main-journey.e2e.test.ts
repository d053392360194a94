/**
 * The main journey in headless Chromium against the real API, worker and database: the engineer
 * builds a 3-plate vehicle (the 3D preview must draw something), sets up a short scenario, runs
 * it, waits for the result, sees the budget table filled and downloads the CSV ephemeris; then a
 * reviewer finds no edit control on the same pages. Screenshots of each step go to
 * test-artifacts/e2e/journey-*.png.
 */
import path from 'node:path';
import { readFileSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { artifactsDir, openBrowser } from './browser';
import { canvasContent, signIn } from './page-helpers';

const shot = (page: Page, name: string) => page.screenshot({ path: path.join(artifactsDir, `journey-${name}.png`), fullPage: true });



describe('main journey: vehicle, scenario, run, budget, CSV; then a reviewer', () => {
  let browser: Awaited<ReturnType<typeof openBrowser>>;
  let page: Page;
  const tag = randomUUID().slice(0, 6);
  const vehicleName = `Journey box-wing ${tag}`;
  const scenarioName = `Journey half day ${tag}`;
  let missionUrl = '';
  let vehicleUrl = '';
  let scenarioUrl = '';
  let runUrl = '';

  beforeAll(async () => {
    browser = await openBrowser();
    page = await browser.context.newPage();
  });
  afterAll(() => browser?.close());

  it('the engineer builds a 3-plate vehicle and the 3D preview draws it', async () => {
    await signIn(page, 'engineer');
    await page.getByRole('link', { name: 'Corvina-2' }).click();
    await page.getByRole('heading', { name: 'Corvina-2' }).waitFor();
    missionUrl = page.url();
    await page.getByRole('link', { name: 'New vehicle' }).click();
    await page.getByLabel('Vehicle name').fill(vehicleName);
    await page.getByLabel('Mass (kg)').fill('850');
    const areaInputs = () => page.getByLabel(/^Plate \d+ area/);
    while ((await areaInputs().count()) < 3) await page.getByRole('button', { name: 'Add plate' }).click();
    expect(await areaInputs().count()).toBe(3);
    // A bus face toward +x and two wings, each with its own normal.
    const plates = [
      { area: '4.5', normal: ['1', '0', '0'], centroid: ['1', '0', '0'] },
      { area: '12', normal: ['0', '0', '1'], centroid: ['0', '5', '0'] },
      { area: '12', normal: ['0', '0', '1'], centroid: ['0', '-5', '0'] },
    ];
    for (const [i, p] of plates.entries()) {
      const n = i + 1;
      await page.getByLabel(`Plate ${n} area (m²)`).fill(p.area);
      for (const [j, axis] of ['x', 'y', 'z'].entries()) {
        await page.getByLabel(new RegExp(`^Plate ${n} normal ${axis}`)).fill(p.normal[j]!);
        await page.getByLabel(new RegExp(`^Plate ${n} centroid ${axis}`)).fill(p.centroid[j]!);
      }
    }
    await page.getByLabel('3D preview of the vehicle').first().waitFor();
    // Give the software renderer a few frames.
    await page.waitForTimeout(1500);
    await shot(page, '1-vehicle-editor');
    const content = await canvasContent(page, '[aria-label="3D preview of the vehicle"]');
    expect(content.width).toBeGreaterThan(100);
    expect(content.colours, 'the preview canvas is not one flat colour').toBeGreaterThan(20);
    expect(content.drawnShare, 'something is drawn over the background').toBeGreaterThan(0.005);

    await page.getByRole('button', { name: 'Create vehicle' }).click();
    await page.waitForURL(/\/vehicles\/[0-9a-f-]{36}$/);
    vehicleUrl = page.url();
    await page.getByRole('button', { name: 'Save revision' }).waitFor();
  });

  it('sets up a half-day scenario with that vehicle', async () => {
    await page.goto(missionUrl);
    await page.getByRole('link', { name: 'New scenario' }).click();
    await page.getByLabel('Scenario name').fill(scenarioName);
    await page.getByLabel('Vehicle', { exact: true }).selectOption({ label: `${vehicleName} (rev. 1)` });
    await page.getByLabel('Span (days)').fill('0.5');
    await page.getByLabel('Output step (s)').fill('600');
    await shot(page, '2-scenario-form');
    await page.getByRole('button', { name: 'Create scenario' }).click();
    await page.waitForURL(/\/scenarios\/[0-9a-f-]{36}$/);
    scenarioUrl = page.url();
    await page.getByRole('button', { name: 'Start run' }).waitFor();
  });

  it('runs it, waits for the result, sees the budget table filled and downloads the CSV', async () => {
    await page.getByRole('button', { name: 'Start run' }).click();
    await page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
    runUrl = page.url();
    await page.getByRole('table', { name: /Budget lines/ }).waitFor({ timeout: 90_000 });
    const rows = page.getByRole('table', { name: /Budget lines/ }).locator('tbody tr');
    expect(await rows.count()).toBeGreaterThan(5);
    const budgetText = await page.getByRole('table', { name: /Budget lines/ }).innerText();
    expect(budgetText).toMatch(/m\/s/); // values carry units
    await expect(page.getByText(/analysis aid/).count()).resolves.toBeGreaterThan(0);
    await page.waitForTimeout(1000);
    await shot(page, '3-run-result');

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download CSV ephemeris' }).click()]);
    const file = await download.path();
    const text = readFileSync(file!, 'utf8');
    const header = text.split('\n').filter((l) => l.startsWith('#')).join('\n');
    expect(header).toMatch(/frame/i);
    expect(header).toMatch(/UTC/);
    expect(header).toMatch(/epoch/i);
    expect(header).toMatch(/analysis aid/);
    const columns = text.split('\n').find((l) => !l.startsWith('#'))!;
    expect(columns.startsWith('time_utc,t_s,x_m,y_m,z_m')).toBe(true);
    // Half a day at 600 s: 73 rows after the column line.
    expect(text.trim().split('\n').filter((l) => !l.startsWith('#')).length - 1).toBe(73);
  });

  it('a reviewer sees the same pages with no edit control', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in to Photon Ledger' }).waitFor();
    await signIn(page, 'reviewer');
    const editControls = ['Save revision', 'Create vehicle', 'Add plate', 'Undo', 'Import plate CSV', 'Save scenario', 'Create scenario', 'Start run', 'Cancel run', 'Re-run', 'Cancel', 'Delete scenario'];
    for (const [url, marker] of [[vehicleUrl, vehicleName], [scenarioUrl, scenarioName], [runUrl, 'Budget']] as const) {
      await page.goto(url);
      await page.getByText(marker).first().waitFor();
      await page.waitForTimeout(500);
      for (const name of editControls) {
        expect(await page.getByRole('button', { name, exact: true }).count(), `${name} on ${url}`).toBe(0);
      }
      // Inputs: the run page has view controls only (chart frame, playback time and speed).
      if (url !== runUrl) {
        expect(await page.locator('main input:enabled:not([type="range"]), main select:enabled, main textarea:enabled').count(), `enabled inputs on ${url}`).toBe(0);
      }
    }
    await shot(page, '4-reviewer-run');
  });
});
