import { expect, test, type APIRequestContext } from '@playwright/test';
import path from 'node:path';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import type { OrderDetail, OrderPage } from '../../src/shared/intake-contract';
import { leadApi, operatorAtStation } from './support/floor-steps';
import { screenshotAt } from './support/screenshots';

// Manual: a weed station keeps working when the Wi-Fi drops. The lead pairs the tablet with Weed 1,
// an operator signs in with a PIN and scans bag 1043-C; the network goes; the operator marks pieces
// weeded and logs a spoil with a photo; the tablet reloads with no network and still works; the
// sync tray shows the work waiting; the network returns and the hub has exactly that work.

const PHOTO = path.resolve(__dirname, 'fixtures', 'spoil-photo.jpg');
const BAG = '1043-C';

async function bagAtHub(lead: APIRequestContext) {
  const orders = (await (await lead.get('/api/orders')).json()) as OrderPage;
  const order = (await (await lead.get(`/api/orders/${orders.items.find((o) => o.code === '1043')!.id}`)).json()) as OrderDetail;
  return order.bags.find((b) => b.code === BAG)!;
}

test('a weed station keeps working offline and the hub gets exactly its work when the network returns', async ({ page, context }) => {
  test.setTimeout(150_000);
  const lead = await leadApi();
  const operator = DEMO_ACCOUNTS.operators[1];
  const before = await bagAtHub(lead);
  expect(before.counts.weeded).toBeLessThan(before.pieces);

  await test.step('the lead pairs this tablet with Weed 1; an operator signs in with a PIN', async () => {
    await operatorAtStation(page, 'Weed 1', operator);
    await expect(page.getByTestId('station-name')).toHaveText('Weed 1');
  });

  await test.step('open the Weed tally, scan bag 1043-C by typing its code, while the service worker takes over', async () => {
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Weed tally' }).click();
    await page.getByTestId('bag-code-input').fill(' 1043 - c ');
    await page.getByTestId('find-bag').click();
    await expect(page.getByTestId('weed-bag-code')).toHaveText(`Bag ${BAG}`);
    await expect(page.getByTestId('weed-progress')).toHaveText(`${before.counts.weeded} of ${before.pieces} weeded`);
    // The spoil reasons are kept on the tablet when the Spoil report first opens online.
    await page.getByTestId('weed-log-spoil').click();
    await expect(page.getByTestId('spoil-reason').first()).toBeVisible();
    await page.goBack();
    await page.evaluate(async () => (await navigator.serviceWorker.ready).active?.state);
    await page.reload();
    await expect.poll(() => page.evaluate(() => !!navigator.serviceWorker.controller), { timeout: 30_000 }).toBe(true);
    await expect(page.getByTestId('sync-state')).toHaveText('Online');
    await expect(page.getByTestId('sync-waiting')).toHaveCount(0, { timeout: 15_000 });
    await screenshotAt(page, 'sync-tray-online');
    await screenshotAt(page, 'sync-tray-online', { width: 1280, height: 800 });
  });

  await test.step('the network goes: the tray says Offline and a tile tap still counts', async () => {
    await context.setOffline(true);
    await expect(page.getByTestId('sync-state')).toHaveText('Offline', { timeout: 20_000 });
    await page.getByTestId('weed-tile').first().click();
    await page.getByTestId('weed-tile').first().click();
    await expect(page.getByTestId('weed-progress')).toHaveText(`${before.counts.weeded + 2} of ${before.pieces} weeded`);
    await expect(page.getByTestId('sync-waiting')).toContainText('waiting');
    await screenshotAt(page, 'weed-tally-offline');
    await screenshotAt(page, 'weed-tally-offline', { width: 1280, height: 800 });
  });

  await test.step('log a spoil of 2 pieces with a photo, with no network', async () => {
    await page.getByTestId('weed-log-spoil').click();
    await expect(page.getByTestId('spoil-save')).toBeDisabled();
    await page.getByTestId('spoil-plus').click();
    await page.getByTestId('spoil-plus').click();
    await page.getByTestId('spoil-reason').first().click();
    await page.getByTestId('spoil-photo-input').setInputFiles(PHOTO);
    await expect(page.getByTestId('spoil-photo-preview')).toBeVisible();
    await screenshotAt(page, 'spoil-report-offline');
    await screenshotAt(page, 'spoil-report-offline', { width: 1280, height: 800 });
    await page.getByTestId('spoil-save').click();
    await expect(page.getByTestId('spoil-confirmation')).toContainText('2 pieces');
  });

  await test.step('reload with no network: the Weed tally opens from the tablet and keeps its counts', async () => {
    await page.goto(`/weed?bag=${before.id}`);
    await expect(page.getByTestId('weed-bag-code')).toHaveText(`Bag ${BAG}`);
    await expect(page.getByTestId('weed-progress')).toHaveText(`${before.counts.weeded + 2} of ${before.pieces} weeded`);
    await expect(page.getByTestId('sync-state')).toHaveText('Offline');
    await expect(page.getByTestId('sync-waiting')).toContainText('waiting');
    await expect(page.getByTestId('sync-photos')).toContainText('1');
    await screenshotAt(page, 'sync-tray-offline');
    await screenshotAt(page, 'sync-tray-offline', { width: 1280, height: 800 });
  });

  await test.step('"all remaining done" offline, then let its undo window pass', async () => {
    const remaining = before.pieces - before.counts.weeded - 2;
    await page.getByTestId('weed-all-done').click();
    await expect(page.getByTestId('weed-progress')).toHaveText(`${before.pieces} of ${before.pieces} weeded`);
    expect(remaining).toBeGreaterThan(0);
  });

  await test.step('the network returns: the tray empties and the hub has the counts, the spoil and the photo', async () => {
    await context.setOffline(false);
    await expect(page.getByTestId('sync-state')).toHaveText('Online', { timeout: 30_000 });
    await expect(page.getByTestId('sync-waiting')).toHaveCount(0, { timeout: 30_000 });
    await expect(page.getByTestId('sync-photos')).toHaveCount(0, { timeout: 30_000 });

    const after = await bagAtHub(lead);
    expect(after.counts.weeded).toBe(before.pieces);
    expect(after.counts.spoiled).toBe(before.counts.spoiled + 2);
    expect(after.remakeCount).toBe(before.remakeCount + 2);

    const spoilId = await page.evaluate(async () => {
      const open = indexedDB.open('dwell-station');
      const db = await new Promise<IDBDatabase>((resolve, reject) => { open.onsuccess = () => resolve(open.result); open.onerror = () => reject(open.error); });
      const rows = await new Promise<{ id: string; kind: string }[]>((resolve) => {
        const all = db.transaction('outbox').objectStore('outbox').getAll();
        all.onsuccess = () => resolve(all.result as { id: string; kind: string }[]);
      });
      return rows.find((row) => row.kind === 'spoil')?.id ?? null;
    });
    expect(spoilId).not.toBeNull();
    const photo = await lead.get(`/api/spoils/${spoilId}/photo`);
    expect(photo.status()).toBe(200);
    expect(photo.headers()['content-type']).toMatch(/^image\//);
    await screenshotAt(page, 'sync-tray-back-online');
  });

  await lead.dispose();
});
