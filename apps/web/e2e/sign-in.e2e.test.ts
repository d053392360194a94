import path from 'node:path';
import { existsSync, statSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { artifactsDir, openBrowser } from './browser';

describe('signing in as the engineer', () => {
  let browser: Awaited<ReturnType<typeof openBrowser>>;
  let context: BrowserContext;
  let page: Page;
  const outsideRequests: string[] = [];

  beforeAll(async () => {
    browser = await openBrowser();
    context = browser.context;
    page = await context.newPage();
    // Fonts and scripts ship with the app: nothing may leave the machine.
    page.on('request', (req) => {
      const url = new URL(req.url());
      if (!['127.0.0.1', 'localhost'].includes(url.hostname) && url.protocol.startsWith('http')) outsideRequests.push(req.url());
    });
  });
  afterAll(() => browser?.close());

  it('a wrong password keeps the user on the sign-in page with the server\'s message', async () => {
    await page.goto(`${inject('baseUrl')}/sign-in`);
    await page.getByLabel('E-mail').fill('ines.okafor@ostrander-vale.example');
    await page.getByLabel('Password').fill('wrong-password');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByRole('alert').filter({ hasText: 'e-mail or password is wrong' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
  });

  it('shows the two demo missions after sign-in, with no request leaving the machine', async () => {
    const baseUrl = inject('baseUrl');
    await page.goto(`${baseUrl}/`);
    // Not signed in yet: the client sends us to the sign-in page.
    await page.getByRole('heading', { name: 'Sign in to Photon Ledger' }).waitFor();
    await page.screenshot({ path: path.join(artifactsDir, 'sign-in.png'), fullPage: true });

    await page.getByLabel('E-mail').fill('ines.okafor@ostrander-vale.example');
    await page.getByLabel('Password').fill('demo-engineer-2026');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();

    await page.getByRole('heading', { name: 'Missions' }).waitFor();
    await page.getByRole('link', { name: 'Corvina-2' }).waitFor();
    await page.getByRole('link', { name: 'Halyard-1' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/missions');
    await expect(page.getByText(/analysis aid/).count()).resolves.toBeGreaterThan(0);

    const shot = path.join(artifactsDir, 'missions.png');
    await page.screenshot({ path: shot, fullPage: true });
    expect(existsSync(shot) && statSync(shot).size).toBeGreaterThan(10_000);
    expect(outsideRequests).toEqual([]);
  });

  it('signing out returns to the sign-in page and the missions are no longer reachable', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in to Photon Ledger' }).waitFor();
    await page.goto(`${inject('baseUrl')}/missions`);
    await page.getByRole('heading', { name: 'Sign in to Photon Ledger' }).waitFor();
  });
});
