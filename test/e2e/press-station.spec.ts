import { expect, test } from '@playwright/test';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import type { OrderDetail, OrderPage } from '../../src/shared/intake-contract';
import type { RecipeListItem } from '../../src/shared/press/press-contract';
import { e2eBaseUrl } from './support/e2e-hub';
import { leadApi, operatorAtStation } from './support/floor-steps';
import { screenshotAt } from './support/screenshots';

// Manual: the Press station. An operator on the air press (Press 2) scans a bag's label, reads the
// Press card (temperature, dwell, gauge, layer order, safety cautions), runs the countdown for one
// piece, and sees the pressed count rise; the hub has the count after sync. The lead then opens the
// Recipe book.
//
// The countdown always runs on the card's own seconds. To keep the journey short the lead first
// edits the demo recipe (Standard PU on 50/50 cotton-poly) to 1 s pre-press, 1 s tack and 4 s dwell
// through the Recipe book's API, exactly as a lead could, and puts the old values back at the end.

const FILM = 'Standard PU 90 µm';
const FABRIC = '50/50 cotton-poly';

function recipeValues(recipe: RecipeListItem) {
  const { tempC, dwellS, pressureClass, peel, prePressS, tackS, secondPressS, notes, source } = recipe;
  return { tempC, dwellS, pressureClass, peel, prePressS, tackS, secondPressS, notes, source };
}

test('an operator on the air press scans the two-layer hoodies, reads the card, presses one piece and the hub counts it', async ({ page }) => {
  test.setTimeout(120_000);
  const lead = await leadApi();
  const operator = DEMO_ACCOUNTS.operators[0];

  const recipes = (await (await lead.get('/api/recipes')).json()) as RecipeListItem[];
  const recipe = recipes.find((r) => r.filmTypeName === FILM && r.fabricName === FABRIC)!;
  expect(recipe).toBeDefined();

  const orders = (await (await lead.get('/api/orders')).json()) as OrderPage;
  const order = (await (await lead.get(`/api/orders/${orders.items.find((o) => o.code === '1044')!.id}`)).json()) as OrderDetail;
  const bag = order.bags.find((b) => b.code === '1044-A')!;
  const pressedBefore = bag.counts.pressed;

  try {
    await test.step('the lead shortens the demo recipe\'s seconds for this journey', async () => {
      const put = await lead.put(`/api/recipes/${recipe.id}`, { data: { ...recipeValues(recipe), prePressS: 1, tackS: 1, dwellS: 4 } });
      expect(put.ok()).toBe(true);
    });

    await test.step('a lead pairs this tablet with Press 2 (the air press) and an operator signs in with a PIN', async () => {
      await operatorAtStation(page, 'Press 2', operator);
      await expect(page.getByTestId('station-name')).toHaveText('Press 2');
    });

    await test.step('the top bar offers the Press card at a press station; before a scan it already shows the cautions', async () => {
      await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Press card' }).click();
      await expect(page).toHaveURL(/\/press$/);
      await expect(page.getByTestId('press-cautions')).toContainText('Hot platen');
    });

    await test.step('scan bag 1044-A\'s label (a USB scanner types the label\'s address): the Press card appears', async () => {
      await page.getByTestId('bag-code-input').fill(`${e2eBaseUrl()}/bag/${bag.token}`);
      await page.getByTestId('find-bag').click();
      await expect(page.getByTestId('press-bag-code')).toHaveText('1044-A');
      await expect(page.getByTestId('press-temperature')).toContainText('°F');
      await expect(page.getByTestId('press-temperature')).toContainText('°C');
      await expect(page.getByTestId('press-dwell')).toContainText('4 s');
      await expect(page.getByTestId('press-gauge')).toContainText('psi');
      await expect(page.getByTestId('press-layers').locator('li')).toHaveCount(2);
      await expect(page.getByTestId('press-layers').locator('li').first()).toContainText('White');
      await expect(page.getByTestId('press-layers').locator('li').first()).toContainText('Tack 1 s');
      await expect(page.getByTestId('press-layers').locator('li').nth(1)).toContainText('Red');
      await expect(page.getByTestId('press-cautions')).toContainText('Pinch point');
      await expect(page.getByTestId('press-cautions')).toContainText('Fumes');
      await expect(page.getByTestId('press-count-number')).toHaveText(String(pressedBefore));
      await screenshotAt(page, 'press-card');
      await screenshotAt(page, 'press-card', { width: 1280, height: 800 });
    });

    await test.step('one tap per step: pre-press, lay and tack the white, lay the red and dwell; the piece counts at the end', async () => {
      const start = page.getByTestId('countdown-start');
      await start.click();
      await expect(page.getByTestId('countdown-step')).toHaveText('Pre-press');
      await expect(start).toContainText('Start tack: first layer');
      await start.click();
      await expect(page.getByTestId('countdown-step')).toHaveText('Tack: first layer');
      await expect(start).toContainText('Start dwell: second layer');
      await page.keyboard.press('PageDown'); // the foot switch
      await expect(page.getByTestId('countdown-step')).toHaveText('Dwell: second layer');
      await screenshotAt(page, 'press-countdown');
      await screenshotAt(page, 'press-countdown', { width: 1280, height: 800 });
      await expect(page.getByTestId('countdown-finished')).toBeVisible();
      await expect(page.getByTestId('press-count-number')).toHaveText(String(pressedBefore + 1));
      await screenshotAt(page, 'press-piece-done');
    });

    await test.step('after sync the hub has the pressed piece', async () => {
      await expect
        .poll(async () => ((await (await lead.get(`/api/bags/by-token/${bag.token}`)).json()) as { bag: { counts: { pressed: number } } }).bag.counts.pressed, {
          timeout: 15_000,
        })
        .toBe(pressedBefore + 1);
    });

    await test.step('the lead opens the Recipe book and sees the recipe with °F first and the supplier note', async () => {
      await page.getByRole('button', { name: 'Sign out', exact: true }).click();
      await page.goto('/sign-in');
      await page.getByLabel('E-mail').fill(DEMO_ACCOUNTS.lead.email);
      await page.getByLabel('Password').fill(DEMO_ACCOUNTS.lead.password);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Recipe book' }).click();
      await expect(page.getByTestId('recipe-note')).toContainText("follow your film supplier's instructions");
      await page.getByTestId('recipe-filter').fill('cotton-poly');
      await expect(page.getByTestId('recipe-table')).toContainText(FILM);
      await screenshotAt(page, 'recipe-book');
      await screenshotAt(page, 'recipe-book', { width: 1280, height: 800 });
      await page.getByRole('button', { name: `Edit ${FILM} on ${FABRIC}` }).click();
      await page.getByTestId('recipe-temperature').fill('482');
      await page.getByTestId('recipe-save').click();
      await expect(page.getByTestId('problem-temperature')).toContainText('from 176 to 446 °F');
      await expect(page.getByTestId('recipe-history')).toContainText('changed');
      await screenshotAt(page, 'recipe-book-edit');
    });
  } finally {
    await lead.put(`/api/recipes/${recipe.id}`, { data: recipeValues(recipe) });
    await lead.dispose();
  }
});
