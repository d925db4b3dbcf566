import { expect, test } from '@playwright/test';
import path from 'node:path';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import { screenshotAt } from './support/screenshots';

// Manual: how the lead takes in an order. A new customer, a design, a roster of names and numbers
// with one row to fix, bags, and the labels that go on the bags.

const fixtures = path.resolve(__dirname, 'fixtures');
const wide = { width: 1280, height: 800 };

test('the lead takes in a roster order for a new customer and prints its bag labels', async ({ page }) => {
  await test.step('sign in as the lead and open Orders', async () => {
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(DEMO_ACCOUNTS.lead.email);
    await page.getByLabel('Password').fill(DEMO_ACCOUNTS.lead.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Orders' }).click();
    await expect(page.getByRole('heading', { name: 'Orders', level: 1 })).toBeVisible();
    await expect(page.getByText('Loading orders…')).toHaveCount(0);
    await screenshotAt(page, 'orders');
    await screenshotAt(page, 'orders', wide);
  });

  await test.step('New order: without a due date the form says so next to the date', async () => {
    await page.getByTestId('new-order').click();
    await expect(page.getByRole('heading', { name: 'New order' })).toBeVisible();
    await page.getByTestId('new-customer-toggle').click();
    await page.getByLabel('Customer name').fill('Hollinford Otters Swim Club');
    await page.getByLabel('Contact person').fill('Wren Ashby');
    await page.getByLabel('E-mail').fill('otters@hollinford-otters.example');
    await page.getByTestId('save-order').click();
    await expect(page.getByTestId('error-dueDate')).toHaveText('Pick the date the order is due.');
    await screenshotAt(page, 'order-form-missing-date');
    await screenshotAt(page, 'order-form-missing-date', wide);
  });

  await test.step('pick a due date and create the order', async () => {
    const due = new Date(Date.now() + 10 * 24 * 3600 * 1000);
    await page.getByTestId('due-date').fill(`${due.getMonth() + 1}/${due.getDate()}/${due.getFullYear()}`);
    await page.getByTestId('save-order').click();
    await expect(page.getByTestId('order-code')).toBeVisible();
    await expect(page.getByTestId('order-customer')).toHaveText('Hollinford Otters Swim Club');
  });

  await test.step('Add job: upload the design; its size fills in from the file', async () => {
    await page.getByTestId('add-job').click();
    await page.getByTestId('job-name').fill('Team backs');
    await page.getByTestId('design-file').setInputFiles(path.join(fixtures, 'otter-crest.svg'));
    await expect(page.getByTestId('design-preview')).toBeVisible();
    await expect(page.getByTestId('design-width')).toHaveValue('4');
    await expect(page.getByTestId('design-height')).toHaveValue('3');
    await page.getByRole('button', { name: 'Full back' }).click();
    await page.getByTestId('layer-film-1').click();
    await page.getByRole('option').first().click();
    await page.getByTestId('garment').fill('Swim club tee');
    await page.getByTestId('fabric').click();
    await page.getByRole('option').first().click();
    await screenshotAt(page, 'job-form');
    await screenshotAt(page, 'job-form', wide);
  });

  await test.step('import the roster: one bad row is shown in red and Save waits', async () => {
    await page.getByTestId('mode-roster').click();
    await page.getByTestId('roster-file').setInputFiles(path.join(fixtures, 'otters-roster.csv'));
    await expect(page.getByTestId('roster-summary')).toContainText('3 rows ready, 1 needs fixing');
    await expect(page.getByTestId('roster-row-errors')).toContainText('"101" is not a jersey number');
    await expect(page.getByTestId('save-job')).toBeDisabled();
    await page.getByTestId('roster-summary').scrollIntoViewIfNeeded();
    await screenshotAt(page, 'roster-bad-row');
    await screenshotAt(page, 'roster-bad-row', wide);
  });

  await test.step('fix the row in place; once every row is good, save the job', async () => {
    const bad = page.locator('[data-testid=roster-row][data-line="4"]');
    await bad.getByTestId('edit-number').fill('10');
    await bad.getByTestId('edit-number').press('Tab');
    await bad.getByTestId('edit-size').fill('L');
    await bad.getByTestId('edit-size').press('Tab');
    await expect(page.getByTestId('roster-summary')).toContainText('4 rows ready, 0 need fixing');
    await expect(page.getByTestId('save-job')).toBeEnabled();
    await screenshotAt(page, 'roster-fixed');
    await page.getByTestId('save-job').click();
    await expect(page.getByTestId('job-card')).toContainText('Team backs');
    await expect(page.getByTestId('job-card')).toContainText('4 pieces');
  });

  await test.step('split the job into bags', async () => {
    await page.getByTestId('max-pieces').fill('2');
    await page.getByTestId('split-bags').click();
    await expect(page.getByTestId('order-confirmation')).toContainText('Team backs is in 2 bags.');
    await expect(page.getByTestId('bag-row')).toHaveCount(2);
    await screenshotAt(page, 'order-detail');
    await screenshotAt(page, 'order-detail', wide);
  });

  await test.step('print labels: one label per bag, each with its big code and a QR code', async () => {
    await page.getByTestId('print-labels').click();
    await expect(page.getByTestId('bag-label')).toHaveCount(2);
    await expect(page.getByTestId('bag-code').first()).toBeVisible();
    await expect(page.locator('dw-bag-qr svg path').first()).toHaveAttribute('d', /M\d+ \d+h1v1h-1z/);
    const qrText = await page.locator('dw-bag-qr svg').first().getAttribute('data-qr-text');
    expect(qrText).toMatch(new RegExp(`^${new URL(page.url()).origin}/bag/[A-Za-z0-9_-]{43}$`));
    await screenshotAt(page, 'labels');
    await screenshotAt(page, 'labels', wide);
    await page.emulateMedia({ media: 'print' });
    await screenshotAt(page, 'labels-print');
    await page.emulateMedia({ media: 'screen' });
  });
});
