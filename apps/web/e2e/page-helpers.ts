import { inject } from 'vitest';
import type { Page } from 'playwright-core';

/** The demo accounts the browser tests sign in with (fixtures' demo data). */
export const demoUsers = {
  engineer: ['ines.okafor@ostrander-vale.example', 'demo-engineer-2026'],
  lead: ['teodor.lindqvist@ostrander-vale.example', 'demo-lead-2026'],
  reviewer: ['mara.castellanos@ostrander-vale.example', 'demo-reviewer-2026'],
} as const;
export type DemoRole = keyof typeof demoUsers;

/** Signs in through the sign-in page and waits for the missions list. */
export async function signIn(page: Page, role: DemoRole): Promise<void> {
  await page.goto(`${inject('baseUrl')}/sign-in`);
  await page.getByLabel('E-mail').fill(demoUsers[role][0]);
  await page.getByLabel('Password').fill(demoUsers[role][1]);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.getByRole('heading', { name: 'Missions' }).waitFor();
}

/**
 * What a canvas shows, read back through a 2D copy (WebGL canvases included): distinct colours,
 * the share of pixels unlike the corner pixel (the background), and the CSS width. `selector`
 * names the canvas or an element holding it.
 */
export async function canvasContent(page: Page, selector: string): Promise<{ colours: number; drawnShare: number; width: number }> {
  return page.evaluate((sel) => {
    const host = document.querySelector(sel);
    const canvas = host instanceof HTMLCanvasElement ? host : host?.querySelector('canvas');
    if (!canvas) throw new Error(`no canvas at ${sel}`);
    const copy = document.createElement('canvas');
    copy.width = canvas.width;
    copy.height = canvas.height;
    const ctx = copy.getContext('2d')!;
    ctx.drawImage(canvas, 0, 0);
    const data = ctx.getImageData(0, 0, copy.width, copy.height).data;
    const colours = new Set<number>();
    let drawn = 0;
    const [r0, g0, b0] = [data[0]!, data[1]!, data[2]!];
    for (let i = 0; i < data.length; i += 4) {
      if (data[i + 3] === 0) continue; // transparent: nothing drawn there
      colours.add((data[i]! << 16) | (data[i + 1]! << 8) | data[i + 2]!);
      if (Math.abs(data[i]! - r0) + Math.abs(data[i + 1]! - g0) + Math.abs(data[i + 2]! - b0) > 30) drawn += 1;
    }
    return { colours: colours.size, drawnShare: drawn / (data.length / 4), width: canvas.getBoundingClientRect().width };
  }, selector);
}
