import type { Page } from '@playwright/test';
import path from 'node:path';

const folder = path.resolve(__dirname, '..', '..', 'artifacts', 'screenshots');

/** Saves the page at the given tablet size under test/artifacts/screenshots (git-ignored), for a person to look at. */
export async function screenshotAt(page: Page, name: string, size: { width: number; height: number } = { width: 1024, height: 768 }): Promise<void> {
  const before = page.viewportSize();
  await page.setViewportSize(size);
  await page.screenshot({ path: path.join(folder, `${name}-${size.width}x${size.height}.png`), fullPage: false });
  if (before) await page.setViewportSize(before);
}
