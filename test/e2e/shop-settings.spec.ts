import { expect, test } from '@playwright/test';
import type { ShopSettings, ShopSettingsInput } from '../../src/shared/shop-contract';
import { e2eBaseUrl } from './support/e2e-hub';
import { signInWithEmail } from './support/floor-steps';
import { screenshotAt } from './support/screenshots';

// Manual: how the owner keeps the shop's settings. The owner opens Shop settings, is stopped by a
// time zone that does not exist, opens the shop on Saturdays, moves the shift's end to 16:00, adds a
// closed day for a stocktake, and saves. The lead's Floor board, open on another tablet, takes the new hours at once; the lead can
// read the settings but not change them.

// The demo shop is in London; the tablets show its clock.
test.use({ timezoneId: 'Europe/London' });

function inputOf({ updatedAt: _updatedAt, ...settings }: ShopSettings): ShopSettingsInput {
  return settings;
}

test('the owner opens Saturdays and a longer shift; the lead\'s board follows at once and the lead may only read them', async ({ page, browser }) => {
  const leadTablet = await (await browser.newContext({ timezoneId: 'Europe/London' })).newPage();
  await signInWithEmail(page, 'owner');
  const original = (await (await page.request.get('/api/shop')).json()) as ShopSettings;

  try {
    await test.step('the lead\'s Floor board shows today\'s shift, 07:00 to 15:30', async () => {
      await signInWithEmail(leadTablet, 'lead');
      await expect(leadTablet.getByRole('heading', { name: 'Floor board', level: 1 })).toBeVisible();
      await expect(leadTablet.getByTestId('board-shift')).toHaveText('Shift 07:00–15:30');
    });

    await test.step('the owner opens Shop settings: the demo shop works Monday to Friday in London', async () => {
      await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Shop settings' }).click();
      await expect(page.getByRole('heading', { name: 'Shop settings', level: 1 })).toBeVisible();
      await expect(page.getByTestId('shop-name')).toHaveValue('Bramble Yard Apparel');
      await expect(page.getByTestId('time-zone')).toHaveValue('Europe/London');
      await expect(page.getByRole('button', { name: 'Monday' })).toHaveAttribute('aria-pressed', 'true');
      await expect(page.getByRole('button', { name: 'Saturday' })).toHaveAttribute('aria-pressed', 'false');
      await expect(page.getByTestId('shop-save')).toBeDisabled();
      await screenshotAt(page, 'shop-settings');
      await screenshotAt(page, 'shop-settings', { width: 1280, height: 800 });
    });

    await test.step('a time zone that does not exist gets a sentence beside it, and nothing is saved', async () => {
      await page.getByTestId('time-zone').fill('Europe/Hollinford');
      await page.getByTestId('time-zone').press('Escape');
      await page.getByTestId('shop-save').click();
      await expect(page.getByTestId('problem-timeZone')).toContainText('Europe/Hollinford');
      const stored = (await (await page.request.get('/api/shop')).json()) as ShopSettings;
      expect(stored.timeZone).toBe('Europe/London');
    });

    await test.step('the owner puts London back, opens Saturdays, ends the shift at 16:00, closes for a stocktake and saves', async () => {
      await page.getByTestId('time-zone').fill('Europe/London');
      await page.getByTestId('time-zone').press('Escape');
      await page.getByRole('button', { name: 'Saturday' }).click();
      await expect(page.getByRole('button', { name: 'Saturday' })).toHaveAttribute('aria-pressed', 'true');
      await page.getByTestId('shift-end').fill('16:00');
      await page.getByTestId('closed-date').fill('2027-04-02');
      await page.getByTestId('closed-note').fill('Stocktake');
      await page.getByTestId('closed-add').click();
      await expect(page.locator('[data-testid=closed-day][data-date="2027-04-02"]')).toContainText('Stocktake');
      await page.getByTestId('shop-save').click();
      await expect(page.getByTestId('shop-confirmation')).toHaveText('Shop settings saved.');
      await expect(page.getByTestId('problem-timeZone')).toHaveCount(0);
      const stored = (await (await page.request.get('/api/shop')).json()) as ShopSettings;
      expect(stored).toMatchObject({ timeZone: 'Europe/London', shiftEnd: '16:00', workingDays: [1, 2, 3, 4, 5, 6] });
      expect(stored.closedDays).toContainEqual({ date: '2027-04-02', note: 'Stocktake' });
    });

    await test.step('the lead\'s board takes the new hours without a reload', async () => {
      await expect(leadTablet.getByTestId('board-shift')).toHaveText('Shift 07:00–16:00');
    });

    await test.step('the lead opens Shop settings and may read them but not change them', async () => {
      await leadTablet.goto('/shop-settings');
      await expect(leadTablet.getByTestId('shop-read-only')).toContainText('Only the owner');
      await expect(leadTablet.getByTestId('shift-end')).toHaveValue('16:00');
      await expect(leadTablet.getByTestId('shift-end')).toBeDisabled();
      await expect(leadTablet.getByRole('button', { name: 'Saturday' })).toBeDisabled();
      await expect(leadTablet.getByTestId('shop-save')).toHaveCount(0);
      await screenshotAt(leadTablet, 'shop-settings-lead');
    });
  } finally {
    // Later journeys expect the demo shop's own hours.
    const restored = await page.request.put('/api/shop', { data: inputOf(original), headers: { Origin: e2eBaseUrl() } });
    expect(restored.ok()).toBe(true);
    await leadTablet.context().close();
  }
});
