/**
 * Mesh vehicles in headless Chromium against the real API, worker and database: the engineer
 * imports a small OBJ written here (a 1 m box with a 2 m plate above it, so the plate shades part
 * of the box's top), sees its summary, opens its page where the 3D view (lit fractions ray cast in
 * the browser) must draw something, makes a mesh vehicle at a 15° table, waits for the table and
 * sees the map of |F| over Sun directions; then a reviewer finds no import form and no edit
 * control. Screenshots go to test-artifacts/e2e/mesh-*.png.
 */
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { artifactsDir, openBrowser } from './browser';
import { canvasContent, signIn } from './page-helpers';

const shot = (page: Page, name: string) => page.screenshot({ path: path.join(artifactsDir, `mesh-${name}.png`), fullPage: true });



/** A 1 m box at the origin (group bus) and a 2 m square plate 1 m above its top facing +z (group shade). */
const boxAndPlateObj = `# box and shading plate, metres, counter-clockwise seen from outside
o bus
v -0.5 -0.5 -0.5
v 0.5 -0.5 -0.5
v 0.5 0.5 -0.5
v -0.5 0.5 -0.5
v -0.5 -0.5 0.5
v 0.5 -0.5 0.5
v 0.5 0.5 0.5
v -0.5 0.5 0.5
f 1 4 3 2
f 5 6 7 8
f 1 2 6 5
f 2 3 7 6
f 3 4 8 7
f 4 1 5 8
o shade
v -1 -1 1.5
v 1 -1 1.5
v 1 1 1.5
v -1 1 1.5
f 9 10 11 12
`;

const MESH_VIEW = '3D view of the mesh, lit for the chosen Sun direction';
const FORCE_MAP = 'Map of SRP force magnitude over Sun directions';

describe('mesh vehicle: import, lit 3D view, 15° table and its map; then a reviewer', () => {
  let browser: Awaited<ReturnType<typeof openBrowser>>;
  let page: Page;
  const tag = randomUUID().slice(0, 6);
  const meshName = `Box and shade ${tag}`;
  const vehicleName = `Shaded box ${tag}`;
  let meshesUrl = '';
  let meshUrl = '';
  let vehicleUrl = '';

  beforeAll(async () => {
    browser = await openBrowser();
    page = await browser.context.newPage();
  });
  afterAll(() => browser?.close());

  it('the engineer imports an OBJ and sees its summary', async () => {
    await signIn(page, 'engineer');
    await page.getByRole('link', { name: 'Corvina-2' }).click();
    await page.getByRole('heading', { name: 'Corvina-2' }).waitFor();
    await page.getByRole('link', { name: 'Meshes', exact: true }).click();
    await page.getByRole('heading', { name: 'Import a mesh' }).waitFor();
    meshesUrl = page.url();

    // Caught at the field before anything is sent: no file, a rotation that is not a number.
    await page.getByLabel('Rotation about y (°)').fill('ninety');
    await page.getByRole('button', { name: 'Import mesh' }).click();
    await page.getByText('Choose an OBJ or STL file.').waitFor();
    expect(await page.getByLabel('Rotation about y (°)').getAttribute('aria-invalid')).toBe('true');
    await page.getByLabel('Rotation about y (°)').fill('0');

    // The API's message for bad syntax lands at the file field with its line number.
    await page.getByLabel('Mesh file (.obj, .stl)').setInputFiles({ name: 'broken.obj', mimeType: 'text/plain', buffer: Buffer.from('o x\nv 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 q\n') });
    await page.getByRole('button', { name: 'Import mesh' }).click();
    await page.getByText(/line 5/).first().waitFor();

    await page.getByLabel('Mesh file (.obj, .stl)').setInputFiles({ name: 'box-and-shade.obj', mimeType: 'text/plain', buffer: Buffer.from(boxAndPlateObj) });
    await page.getByLabel(/^Mesh name/).fill(meshName);
    await page.getByRole('button', { name: 'Import mesh' }).click();
    await page.getByRole('status').filter({ hasText: 'Imported' }).waitFor();
    const row = page.getByRole('row').filter({ hasText: meshName });
    await row.waitFor();
    const cells = await row.innerText();
    expect(cells).toMatch(/\b14\b/); // 12 + 2 triangles
    expect(cells).toMatch(/2 × 2 × 2 m/); // bounds
    await shot(page, '1-list');
  });

  it('opens the mesh page and the 3D view draws the lit and shadowed facets', async () => {
    await page.getByRole('region', { name: 'Imported meshes' }).getByRole('link', { name: meshName }).click();
    await page.getByRole('heading', { name: meshName }).waitFor();
    meshUrl = page.url();
    const summary = await page.getByLabel('Mesh summary').innerText();
    expect(summary).toMatch(/Triangles\s+14/);
    expect(summary).toMatch(/Total area\s+10 m²/); // 6 m² of box and 4 m² of plate
    // Lit fractions ray cast in the browser (srp-core in a Web Worker).
    await page.getByText(/Ray cast in the browser/).waitFor({ timeout: 20_000 });
    // Sun 60° above the x-y plane: the plate's shadow covers the box's top (its two triangles go dark).
    await page.getByLabel(/^Sun elevation \(°\)/).fill('60');
    const facetCounts = async () => {
      const readout = await page.getByLabel('Lit fractions read-out').innerText();
      const m = /lit \/ partial \/ dark \/ away\s+(\d+) \/ (\d+) \/ (\d+) \/ (\d+)/.exec(readout);
      return m ? { lit: Number(m[1]), partial: Number(m[2]), dark: Number(m[3]), away: Number(m[4]) } : null;
    };
    await expect.poll(async () => (await facetCounts())?.dark ?? 0, { timeout: 10_000 }).toBeGreaterThanOrEqual(2);
    const counts = (await facetCounts())!;
    expect(counts.lit + counts.partial + counts.dark + counts.away).toBe(14);
    expect(counts.lit).toBeGreaterThan(0);
    await page.getByLabel(MESH_VIEW).waitFor();
    await page.waitForTimeout(1500);
    await shot(page, '2-mesh-page');
    const content = await canvasContent(page, `[aria-label="${MESH_VIEW}"]`);
    expect(content.width).toBeGreaterThan(100);
    expect(content.colours, 'the 3D canvas is not one flat colour').toBeGreaterThan(20);
    expect(content.drawnShare, 'something is drawn over the background').toBeGreaterThan(0.01);
  });

  it('makes a mesh vehicle at a 15° table, waits for it and sees the map', async () => {
    const meshId = /\/meshes\/([0-9a-f-]{36})$/.exec(meshUrl)![1]!;
    await page.goto(meshesUrl);
    await page.getByRole('link', { name: 'New vehicle' }).click();
    await page.getByLabel('Vehicle name').fill(vehicleName);
    await page.getByLabel('Mass (kg)').fill('120');
    await page.getByRole('radio', { name: 'Mesh' }).check();
    await page.getByRole('combobox', { name: 'Mesh', exact: true }).selectOption(meshId);
    await page.getByRole('combobox', { name: 'Grid step (°)' }).selectOption('15');
    await page.getByRole('checkbox', { name: 'Group shade has optics of its own' }).check();
    await page.getByRole('combobox', { name: 'Group shade back optics' }).selectOption('solar-array-back');
    await page.getByLabel(MESH_VIEW).waitFor();
    await shot(page, '3-new-vehicle');
    await page.getByRole('button', { name: 'Create vehicle' }).click();
    await page.waitForURL(/\/vehicles\/[0-9a-f-]{36}$/);
    vehicleUrl = page.url();
    await page.getByLabel(FORCE_MAP).waitFor({ timeout: 45_000 });
    await expect(page.getByRole('progressbar', { name: 'Coefficient table progress' }).getAttribute('aria-valuenow')).resolves.toBe('100');
    const map = page.getByLabel(FORCE_MAP);
    const box = (await map.boundingBox())!;
    // Straight overhead (θ near 0): the plate takes the light.
    await page.mouse.move(box.x + box.width * 0.25, box.y + box.height * 0.02);
    await page.getByText(/θ 0°, φ \d+°/).waitFor();
    expect(await page.getByText(/m² · .* N at 1 au/).count()).toBeGreaterThan(0);
    const mapContent = await canvasContent(page, `[aria-label="${FORCE_MAP}"]`);
    expect(mapContent.colours, 'the map has more than one colour').toBeGreaterThan(10);
    await expect(page.getByText(/analysis aid/).count()).resolves.toBeGreaterThan(0);
    await page.waitForTimeout(800);
    await shot(page, '4-vehicle-table');
  });

  it('a reviewer sees the meshes and the vehicle with no import form and no edit control', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in to Photon Ledger' }).waitFor();
    await signIn(page, 'reviewer');
    await page.goto(meshesUrl);
    await page.getByRole('link', { name: meshName }).waitFor();
    expect(await page.getByRole('button', { name: 'Import mesh' }).count()).toBe(0);
    expect(await page.locator('main input[type="file"]').count()).toBe(0);
    await page.goto(vehicleUrl);
    await page.getByLabel(FORCE_MAP).waitFor({ timeout: 20_000 });
    for (const name of ['Save revision', 'Create vehicle', 'Undo', 'Import mesh']) {
      expect(await page.getByRole('button', { name, exact: true }).count(), name).toBe(0);
    }
    // View controls (Sun direction, the view's sampling) stay; nothing that edits the vehicle.
    expect(await page.locator('main select:enabled:not([data-view-control]), main textarea:enabled, main input[type="checkbox"]:enabled').count()).toBe(0);
    await shot(page, '5-reviewer-vehicle');
  });
});
