import { expect, test } from '@playwright/test';
import { screenshotAt } from './support/screenshots';

// Manual: after one visit with the network on, a tablet opens Dwell with the network off.

test('the app shell opens with the network off after one online visit', async ({ page, context }) => {
  await test.step('open Dwell once online and wait until the service worker has cached the app', async () => {
    await page.goto('/sign-in');
    await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
    await page.evaluate(async () => {
      const registration = await navigator.serviceWorker.ready;
      return registration.active?.state;
    });
    // The worker is active; wait until it controls the page and has its app files in the cache.
    await page.reload();
    await expect
      .poll(() => page.evaluate(async () => (await caches.keys()).some((key) => key.includes('app-shell'))), { timeout: 30_000 })
      .toBe(true);
  });

  await test.step('cut the network and reload: the sign-in page still appears, in its own font', async () => {
    await context.setOffline(true);
    const hubReply = await page.evaluate(() => fetch('/api/health').then((res) => res.status, () => 'no network'));
    expect(hubReply).not.toBe(200);
    await page.reload();
    await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
    const font = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(font).toMatch(/Atkinson Hyperlegible/);
    expect(await page.evaluate(() => document.fonts.check('20px "Atkinson Hyperlegible"'))).toBe(true);
    await screenshotAt(page, 'sign-in-offline');
  });

  await test.step('a station tablet\'s PIN pad route also opens offline', async () => {
    await page.goto('/station');
    // This tablet was never paired, so the PIN pad says so (rather than a browser error page).
    await expect(page.getByRole('heading', { level: 1 })).toContainText('not paired with a station');
    await context.setOffline(false);
  });
});
