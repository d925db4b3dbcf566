import { expect, test, type APIRequestContext, type Locator, type Page, type WebSocketRoute } from '@playwright/test';
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import type { MailPage } from '../../src/shared/mail-contract';
import type { BagSummary, OrderDetail, OrderPage } from '../../src/shared/intake-contract';
import type { RecipeListItem } from '../../src/shared/press/press-contract';
import { leadApi, operatorAtStation, signInWithEmail } from './support/floor-steps';
import { screenshotAt } from './support/screenshots';

// Manual: the Floor board, Pack check and the ready mail. The lead keeps the Floor board open on one
// tablet. On a second tablet an operator at Press 1 presses one apron of the café's order 1042, and
// the board's count for Press 1 and its chart of pieces per hour move within a second, with no
// reload; when the board's own connection drops it says so, keeps its numbers and comes back by
// itself. On a third tablet an operator at Pack 1 scans the bowls club's last bag (1046-B), counts its
// polos in and marks it packed; the order is ready, the customer's ready-for-pickup mail goes out,
// and the lead reads it in the Mail outbox as the customer sees it. The lead opens Reports and
// downloads the week as CSV. Last, the lead adds a wall display, and the wall screen opens the board
// read-only from its link.
//
// The countdown runs on the card's own seconds: to keep the journey short the lead first sets the
// demo recipe for Standard PU on cotton canvas to 1 s pre-press, 2 s dwell and 1 s second press through the Recipe
// book's API, as a lead could, and puts the old values back at the end.

const FILM = 'Standard PU 90 µm';
const FABRIC = 'Cotton canvas';

function recipeValues(recipe: RecipeListItem) {
  const { tempC, dwellS, pressureClass, peel, prePressS, tackS, secondPressS, notes, source } = recipe;
  return { tempC, dwellS, pressureClass, peel, prePressS, tackS, secondPressS, notes, source };
}

async function orderByCode(lead: APIRequestContext, code: string): Promise<OrderDetail> {
  const orders = (await (await lead.get('/api/orders')).json()) as OrderPage;
  return (await (await lead.get(`/api/orders/${orders.items.find((o) => o.code === code)!.id}`)).json()) as OrderDetail;
}

async function bagAtHub(lead: APIRequestContext, token: string): Promise<BagSummary> {
  return ((await (await lead.get(`/api/bags/by-token/${token}`)).json()) as { bag: BagSummary }).bag;
}

/** The number in a board cell, e.g. a station's pieces this shift. */
async function numberIn(cell: Locator): Promise<number> {
  return Number((await cell.innerText()).replace(/[^\d.]/g, ''));
}

/** The sum of a station's hourly pieces in the chart's text table: the chart's numbers, as a reader of the table gets them. */
async function chartTotal(board: Page, station: string): Promise<number> {
  const cells = await board.getByTestId('rates-row').and(board.locator(`[data-station-name="${station}"]`)).locator('td').allInnerTexts();
  return cells.reduce((sum, text) => sum + Number(text), 0);
}

test('the lead watches the floor live, the last bag packed mails the customer, and a wall display shows the board read-only', async ({ page: board, browser }) => {
  test.setTimeout(180_000);
  const lead = await leadApi();
  const recipes = (await (await lead.get('/api/recipes')).json()) as RecipeListItem[];
  const recipe = recipes.find((r) => r.filmTypeName === FILM && r.fabricName === FABRIC)!;
  expect(recipe).toBeDefined();
  const aprons = (await orderByCode(lead, '1042')).bags.find((b) => b.code === '1042-A')!;
  const bowls = await orderByCode(lead, '1046');
  const lastBowlsBag = bowls.bags.find((b) => b.code === '1046-B')!;
  expect(bowls.status).toBe('open');
  expect(lastBowlsBag.stage).toBe('pressed');

  const pressTablet = await (await browser.newContext({ viewport: { width: 1024, height: 768 } })).newPage();
  const packTablet = await (await browser.newContext({ viewport: { width: 1024, height: 768 } })).newPage();
  const pressStation = board.getByTestId('board-station').and(board.locator('[data-station-name="Press 1"]'));
  const boardSockets: WebSocketRoute[] = [];

  try {
    await test.step('the lead shortens the demo recipe\'s seconds for this journey', async () => {
      const put = await lead.put(`/api/recipes/${recipe.id}`, { data: { ...recipeValues(recipe), prePressS: 1, dwellS: 2, secondPressS: recipe.secondPressS ? 1 : recipe.secondPressS } });
      expect(put.ok()).toBe(true);
    });

    // The board's live connection passes through the test, so a later step can cut it like a Wi-Fi drop.
    await board.routeWebSocket(/\/socket\.io\//, (socket) => {
      socket.connectToServer();
      boardSockets.push(socket);
    });

    await test.step('the lead signs in and opens the Floor board: stations, stages, orders and charts', async () => {
      await signInWithEmail(board, 'lead');
      await board.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Floor board' }).click();
      await expect(board).toHaveURL(/\/board$/);
      await expect(board.getByTestId('board-connection')).toContainText('Live');
      await expect(pressStation).toBeVisible();
      await expect(board.getByTestId('stage-column')).toHaveCount(5);
      await expect(board.getByTestId('board-order').and(board.locator('[data-order-code="1046"]'))).toBeVisible();
      // The yield reads as a percentage once pieces were cut this shift, a dash before: both are right at some hour.
      await expect(board.getByTestId('tile-first-pass-yield')).toHaveText(/%|—/);
      await screenshotAt(board, 'floor-board');
      await screenshotAt(board, 'floor-board', { width: 1280, height: 800 });
      await screenshotAt(board, 'floor-board', { width: 1920, height: 1080 });
    });

    const piecesBefore = await numberIn(pressStation.getByTestId('station-shift-pieces'));
    const chartBefore = await chartTotal(board, 'Press 1');
    const weededBefore = await numberIn(board.getByTestId('stage-column').and(board.locator('[data-stage="weeded"]')).getByTestId('stage-pieces'));

    await test.step('on a second tablet, an operator at Press 1 scans the café\'s aprons and presses one', async () => {
      await operatorAtStation(pressTablet, 'Press 1', DEMO_ACCOUNTS.operators[2]);
      await pressTablet.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Press card' }).click();
      await pressTablet.getByTestId('bag-code-input').fill('1042-A');
      await pressTablet.getByTestId('find-bag').click();
      await expect(pressTablet.getByTestId('press-bag-code')).toHaveText('1042-A');
      await expect(pressTablet.getByTestId('press-cautions')).toContainText('Hot platen');
      const start = pressTablet.getByTestId('countdown-start');
      await start.click(); // pre-press
      await expect(start).toContainText('Start dwell');
      await start.click(); // lay the film and dwell
      if (recipe.secondPressS) {
        // This film is peeled warm and pressed a second time under a cover sheet.
        await expect(start).toContainText('Start second press');
        await start.click();
      }
      await expect(pressTablet.getByTestId('countdown-finished')).toBeVisible();
      await expect(pressTablet.getByTestId('press-count-number')).toHaveText(String(aprons.counts.pressed + 1));
    });

    await test.step('within a second of the hub storing the piece, the board\'s count and chart move, with no reload', async () => {
      await expect.poll(async () => (await bagAtHub(lead, aprons.token)).counts.pressed, { intervals: [100], timeout: 15_000 }).toBe(aprons.counts.pressed + 1);
      await expect(pressStation.getByTestId('station-shift-pieces')).toHaveText(new RegExp(`^\\s*${piecesBefore + 1}\\b`), { timeout: 1_000 });
      expect(await chartTotal(board, 'Press 1')).toBe(chartBefore + 1);
      // A bag sits in one stage with all its pieces until every piece has passed: one apron pressed leaves 1042-A weeded.
      expect(await numberIn(board.getByTestId('stage-column').and(board.locator('[data-stage="weeded"]')).getByTestId('stage-pieces'))).toBe(weededBefore);
      await expect(pressStation.getByTestId('station-online')).toContainText('Online');
    });

    await test.step('the board says when its own connection drops, keeps the last numbers, and recovers by itself', async () => {
      const shown = await pressStation.getByTestId('station-shift-pieces').innerText();
      // The hub cannot be reached: new connections are refused and the open one drops.
      await board.route('**/socket.io/**', (route) => route.abort());
      for (const socket of boardSockets.splice(0)) await socket.close();
      await expect(board.getByTestId('board-connection')).toContainText('Connection lost');
      await expect(pressStation.getByTestId('station-shift-pieces')).toHaveText(shown);
      await screenshotAt(board, 'floor-board-connection-lost');
      // The network is back: the board reconnects with no tap and no reload.
      await board.unroute('**/socket.io/**');
      await expect(board.getByTestId('board-connection')).toContainText('Live', { timeout: 20_000 });
    });

    await test.step('on a third tablet, an operator at Pack 1 scans the bowls club\'s last bag and counts the polos in', async () => {
      await operatorAtStation(packTablet, 'Pack 1', DEMO_ACCOUNTS.operators[3]);
      await packTablet.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Pack check' }).click();
      await packTablet.getByTestId('bag-code-input').fill('1046-B');
      await packTablet.getByTestId('find-bag').click();
      await expect(packTablet.getByTestId('pack-bag-code')).toHaveText('Bag 1046-B');
      await expect(packTablet.getByTestId('pack-line')).toHaveCount(2);
      await expect(packTablet.getByTestId('pack-line').first()).toContainText('0 of 4');
      await expect(packTablet.getByTestId('pack-remakes')).toHaveCount(0);
      await packTablet.getByTestId('pack-tick-all').click();
      await expect(packTablet.getByTestId('pack-counted')).toHaveText('6');
      await screenshotAt(packTablet, 'pack-check');
      await screenshotAt(packTablet, 'pack-check', { width: 1280, height: 800 });
      await packTablet.getByTestId('pack-mark').click();
      await expect(packTablet.getByTestId('pack-result')).toBeVisible();
    });

    await test.step('the order is ready: it leaves the board\'s open orders and the ready mail is sent', async () => {
      await expect.poll(async () => (await orderByCode(lead, '1046')).status, { timeout: 15_000 }).toBe('ready');
      await expect(board.getByTestId('board-order').and(board.locator('[data-order-code="1046"]'))).toHaveCount(0, { timeout: 2_000 });
      await expect
        .poll(async () => ((await (await lead.get('/api/mail?kind=order_ready')).json()) as MailPage).items.find((m) => m.subject.includes('1046'))?.status, { timeout: 15_000 })
        .toBe('sent');
    });

    await test.step('the lead opens the Mail outbox and reads the message as the customer sees it', async () => {
      await board.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Mail outbox' }).click();
      const row = board.getByTestId('mail-row').filter({ hasText: '1046' });
      await expect(row).toBeVisible();
      await expect(row.getByTestId('mail-status')).toContainText('Sent');
      await expect(row).toContainText('secretary@hollinford-bowls.example');
      await row.getByTestId('mail-open').click();
      const message = board.frameLocator('[data-testid="mail-html"]');
      await expect(message.locator('body')).toContainText('1046');
      await expect(message.locator('body')).toContainText('Wendell');
      await board.getByTestId('mail-html').scrollIntoViewIfNeeded();
      await screenshotAt(board, 'mail-outbox');
      await screenshotAt(board, 'mail-outbox', { width: 1280, height: 800 });
      await board.getByTestId('mail-view-text').click();
      await expect(board.getByTestId('mail-text')).toContainText('1046');
    });

    await test.step('the lead opens Reports: the last 7 days by station, and the same numbers as a CSV download', async () => {
      await board.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Reports' }).click();
      await expect(board.getByTestId('report-day').last()).toBeVisible();
      const from = await board.getByTestId('report-from').inputValue();
      const to = await board.getByTestId('report-to').inputValue();
      const grandTotal = await numberIn(board.getByTestId('report-grand-total').locator('.pieces'));
      expect(grandTotal).toBeGreaterThan(0);
      await screenshotAt(board, 'reports');
      await screenshotAt(board, 'reports', { width: 1280, height: 800 });
      const [download] = await Promise.all([board.waitForEvent('download'), board.getByTestId('report-csv').click()]);
      expect(download.suggestedFilename()).toMatch(/^dwell-floor-\d{4}-\d{2}-\d{2}-to-\d{4}-\d{2}-\d{2}\.csv$/);
      const rows = Papa.parse<Record<string, string>>(readFileSync((await download.path())!, 'utf8'), { header: true, skipEmptyLines: true }).data;
      expect(rows.reduce((sum, row) => sum + Number(row['pieces']), 0)).toBe(grandTotal);
      expect(rows.some((row) => row['station'] === 'Press 1' && Number(row['pieces']) > 0)).toBe(true);
      expect(from <= to).toBe(true);
    });

    await test.step('the lead adds a wall display on the Stations screen and the wall opens the board read-only from its link', async () => {
      await board.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Stations' }).click();
      await board.getByLabel('Name of the display').fill('Wall by the presses');
      await board.getByRole('button', { name: 'Add a wall display' }).click();
      const link = (await board.getByTestId('display-link').innerText()).trim();
      expect(link).toMatch(/\/display#token=/);
      await screenshotAt(board, 'wall-display-added');

      const wallContext = await browser.newContext({ viewport: { width: 1920, height: 1080 } });
      const wall = await wallContext.newPage();
      await wall.goto(link);
      await expect(wall.getByTestId('stage-column')).toHaveCount(5);
      await expect(wall).not.toHaveURL(/token=/);
      await expect(wall.getByTestId('board-connection')).toContainText('Live');
      // Read-only: no navigation, nothing to tap, and the hub refuses the display anything but the board.
      await expect(wall.getByRole('navigation')).toHaveCount(0);
      await expect(wall.getByRole('button')).toHaveCount(0);
      await expect(wall.getByRole('link')).toHaveCount(0);
      expect((await wall.request.get('/api/board')).status()).toBe(200);
      expect((await wall.request.get('/api/orders')).status()).toBe(403);
      await screenshotAt(wall, 'wall-display', { width: 1920, height: 1080 });
      await screenshotAt(wall, 'wall-display', { width: 1280, height: 800 });
      await wallContext.close();
    });
  } finally {
    await lead.put(`/api/recipes/${recipe.id}`, { data: recipeValues(recipe) });
    await pressTablet.context().close();
    await packTablet.context().close();
  }
});
