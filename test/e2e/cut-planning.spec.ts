import { expect, test, type Page } from '@playwright/test';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import type { OrderDetail, OrderPage } from '../../src/shared/intake-contract';
import { leadApi, pairThisTabletAndHandOver, signInWithEmail, signInWithPin } from './support/floor-steps';
import { screenshotAt } from './support/screenshots';

// Manual: how the lead gangs bags of the same film on the Gang planner and confirms the cut, and how
// the cut operator records a test cut at the Cut station and confirms a cut there. Each step is what
// a person does and what they should see.

/** The film length the preview shows, in mm (the small line under the big length). */
async function shownLengthMm(page: Page): Promise<number> {
  const text = await page.getByTestId('plan-length').locator('.small').innerText();
  return Number(text.replace(/[^0-9]/g, ''));
}

/** The token printed in a bag label's QR code, as the lead's API gives it. */
async function bagToken(orderCode: string, bagCode: string): Promise<string> {
  const lead = await leadApi();
  const orders = (await (await lead.get('/api/orders')).json()) as OrderPage;
  const order = (await (await lead.get(`/api/orders/${orders.items.find((o) => o.code === orderCode)!.id}`)).json()) as OrderDetail;
  await lead.dispose();
  return order.bags.find((b) => b.code === bagCode)!.token;
}

async function rollRemaining(page: Page, label: string): Promise<number> {
  const rolls = (await (await page.request.get('/api/rolls')).json()) as { label: string; remainingMm: number }[];
  return rolls.find((r) => r.label === label)!.remainingMm;
}

test('the lead gangs two bags and confirms; the cut operator test-cuts and confirms at the Cut station', async ({ page }) => {
  await test.step('the lead opens the Gang planner and picks the white film', async () => {
    await signInWithEmail(page, 'lead');
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Gang planner' }).click();
    await expect(page.getByRole('heading', { name: 'Gang planner', level: 1 })).toBeVisible();
    await page.locator('.group-tile', { hasText: 'White' }).filter({ hasText: 'Standard PU' }).first().click();
    await expect(page.getByTestId('bag-1044-A')).toHaveAttribute('aria-checked', 'true');
  });

  await test.step('leave only the two art club bags in the gang: the layout, roll and preset show', async () => {
    // Every other white bag is tapped out of the gang, one tile at a time.
    const others = page.locator('.bag-tile[aria-checked="true"]').filter({ hasNotText: /1044-[AB]/ });
    while ((await others.count()) > 0) {
      const before = await others.count();
      await others.first().click();
      await expect(others).toHaveCount(before - 1);
    }
    await expect(page.locator('.bag-tile[aria-checked="true"]')).toHaveCount(2);
    await expect(page.getByTestId('layout-preview')).toBeVisible();
    await expect(page.getByTestId('plan-roll')).toContainText('R-101');
    await expect(page.getByTestId('plan-preset')).toContainText('90 g');
    await expect(page.getByTestId('download-svg')).toHaveAttribute('href', /layout\.svg\?bagIds=/);
    await screenshotAt(page, 'gang-planner');
    await page.getByTestId('plan-roll').scrollIntoViewIfNeeded();
    await screenshotAt(page, 'gang-planner-preview');
    await screenshotAt(page, 'gang-planner-preview', { width: 1280, height: 800 });
  });

  await test.step('confirm the cut: R-101 loses exactly the shown length', async () => {
    const before = await rollRemaining(page, 'R-101');
    const shown = await shownLengthMm(page);
    await page.getByTestId('confirm-cut').click();
    await expect(page.getByTestId('cut-done')).toContainText('Cut confirmed');
    expect(Math.abs(before - (await rollRemaining(page, 'R-101')) - shown)).toBeLessThanOrEqual(1);
  });

  await test.step('the lead pairs this tablet with Cut 1 and hands it to the cut operator', async () => {
    await pairThisTabletAndHandOver(page, 'Cut 1');
    await signInWithPin(page, DEMO_ACCOUNTS.operators[0]);
  });

  await test.step('the operator reads bag 1043-D\'s label with the tablet\'s camera: its link opens the Cut station with the bag in the cut', async () => {
    await page.goto(`/bag/${await bagToken('1043', '1043-D')}`);
    await expect(page.getByRole('heading', { name: 'Cut station', level: 1 })).toBeVisible();
    await expect(page.getByRole('region', { name: 'Bags in this cut' })).toContainText('1043-D');
    await expect(page.getByTestId('layout-preview')).toBeVisible();
  });

  await test.step('at Cut 1, the operator opens the remaining white bags at the Cut station', async () => {
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Gang planner' }).click();
    await page.locator('.group-tile', { hasText: 'White' }).filter({ hasText: 'Standard PU' }).first().click();
    await expect(page.getByTestId('bag-1043-D')).toHaveAttribute('aria-checked', 'true');
    await expect(page.getByTestId('layout-preview')).toBeVisible();
    await page.getByRole('button', { name: 'Open at the cut station' }).click();
    await expect(page.getByRole('heading', { name: 'Cut station', level: 1 })).toBeVisible();
    await expect(page.getByTestId('layout-preview')).toBeVisible();
  });

  await test.step('the blade caution is on screen; the operator cuts the ladder and taps the force that came clean', async () => {
    await expect(page.getByText('The blade is sharp')).toBeVisible();
    await page.getByTestId('ladder-90').click();
    await expect(page.getByTestId('test-result')).toContainText('Cut at 90 g');
    await expect(page.getByTestId('ladder-90')).toBeEnabled();
    await screenshotAt(page, 'cut-station');
    await screenshotAt(page, 'cut-station', { width: 1280, height: 800 });
  });

  await test.step('confirm the cut: the roll loses the shown length plus the test cut', async () => {
    const label = (await page.getByTestId('plan-roll').innerText()).match(/R-\d+/)![0];
    const before = await rollRemaining(page, label);
    const shown = await shownLengthMm(page);
    await page.getByTestId('confirm-cut').click();
    await expect(page.getByTestId('cut-done')).toContainText('Cut confirmed');
    // The test cut's 50 mm of film is taken with the cut.
    expect(Math.abs(before - (await rollRemaining(page, label)) - (shown + 50))).toBeLessThanOrEqual(1);
  });

  await test.step('the Roll rack shows every roll with what is left and the low ones flagged', async () => {
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Roll rack' }).click();
    await expect(page.getByTestId('roll-R-101')).toBeVisible();
    await page.getByTestId('roll-R-101').getByRole('button', { name: /history/ }).click();
    await expect(page.locator('.history li').first()).toContainText('Cut');
    await screenshotAt(page, 'roll-rack');
    await screenshotAt(page, 'roll-rack', { width: 1280, height: 800 });
  });
});
