import { expect, test } from '@playwright/test';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import { pairThisTabletAndHandOver, typePin } from './support/floor-steps';
import { screenshotAt } from './support/screenshots';

// Manual: how the lead signs in, pairs a tablet with a station, and how an operator then signs in
// on that tablet with a PIN. Each step is what a person does and what they should see.

test('the lead signs in, sees the navigation, pairs this tablet with Press 1 and signs out', async ({ page }) => {
  // The hub's Content Security Policy must not block any of the app's own styles or scripts.
  const blocked: string[] = [];
  page.on('console', (message) => {
    if (/Content Security Policy/i.test(message.text())) blocked.push(message.text());
  });

  await test.step('open Dwell: anyone not signed in lands on the sign-in page', async () => {
    await page.goto('/');
    await expect(page).toHaveURL(/\/sign-in$/);
    await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
    await screenshotAt(page, 'sign-in');
    await screenshotAt(page, 'sign-in', { width: 1280, height: 800 });
  });

  await test.step('a wrong password gets a sentence under the form, not a blank page', async () => {
    await page.getByLabel('E-mail').fill(DEMO_ACCOUNTS.lead.email);
    await page.getByLabel('Password').fill('not-my-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByTestId('sign-in-problem')).toContainText('do not match');
    await screenshotAt(page, 'sign-in-wrong-password');
  });

  await test.step('the right password opens the lead\'s Floor board, with the other screens in the top bar', async () => {
    await page.getByLabel('Password').fill(DEMO_ACCOUNTS.lead.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByTestId('signed-in-person')).toContainText(DEMO_ACCOUNTS.lead.name);
    await expect(page.getByRole('heading', { name: 'Floor board', level: 1 })).toBeVisible();
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Stations' }).click();
    await expect(page.getByRole('heading', { name: 'Stations', level: 1 })).toBeVisible();
  });

  await test.step('on the Stations screen, pair this tablet with Press 1', async () => {
    const press1 = page.getByTestId('station-card').filter({ has: page.getByRole('heading', { name: 'Press 1', exact: true }) });
    await press1.getByRole('button', { name: 'Pair this tablet' }).click();
    await expect(page.getByTestId('pairing-confirmation')).toContainText('Press 1');
    await expect(page.getByTestId('this-tablet')).toContainText('Press 1');
    await screenshotAt(page, 'stations-paired');
    await screenshotAt(page, 'stations-paired', { width: 1280, height: 800 });
  });

  await test.step('the People screen lists who works here and how each signs in', async () => {
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'People' }).click();
    const jo = page.getByTestId('person').filter({ has: page.getByRole('heading', { name: DEMO_ACCOUNTS.operators[0].name }) });
    await expect(jo).toContainText('Signs in at a station with a PIN');
    await expect(jo.getByRole('button', { name: 'Set PIN' })).toBeVisible();
    await screenshotAt(page, 'people');
    await screenshotAt(page, 'people', { width: 1280, height: 800 });
  });

  await test.step('sign out: the lead\'s screens are gone and the hub has ended the session', async () => {
    await page.getByRole('button', { name: 'Sign out', exact: true }).click();
    await expect(page.getByTestId('signed-in-person')).toHaveCount(0);
    const me = await page.request.get('/api/auth/me');
    expect(me.status()).toBe(401);
  });

  expect(blocked).toEqual([]);
});

test('an operator signs in on the paired Press 1 tablet with a PIN', async ({ page }) => {
  const operator = DEMO_ACCOUNTS.operators[1];

  await test.step('a lead pairs this tablet with Press 1 and hands it over', async () => {
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(DEMO_ACCOUNTS.lead.email);
    await page.getByLabel('Password').fill(DEMO_ACCOUNTS.lead.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await pairThisTabletAndHandOver(page, 'Press 1');
  });

  await test.step('the PIN pad shows the station and the operators\' names', async () => {
    await expect(page).toHaveURL(/\/station$/);
    await expect(page.getByTestId('station-name')).toHaveText('Press 1');
    await expect(page.getByRole('button', { name: operator.name })).toBeVisible();
    await screenshotAt(page, 'pin-pad-names');
    await screenshotAt(page, 'pin-pad-names', { width: 1280, height: 800 });
  });

  await test.step('tap your name, type a wrong PIN: a sentence says so and the pad clears', async () => {
    await page.getByRole('button', { name: operator.name }).click();
    await typePin(page, '0000');
    await page.getByTestId('pin-enter').click();
    await expect(page.getByTestId('pin-problem')).toContainText('PIN is not right');
    await expect(page.getByTestId('pin-dots')).toHaveAttribute('aria-label', '0 digits typed');
    await screenshotAt(page, 'pin-pad-wrong-pin');
  });

  await test.step('type the right PIN: the station home shows who is signed in where', async () => {
    await typePin(page, operator.pin);
    await expect(page.getByTestId('pin-dots')).toHaveAttribute('aria-label', `${operator.pin.length} digits typed`);
    await page.getByTestId('pin-enter').click();
    await expect(page.getByTestId('station-name')).toHaveText('Press 1');
    await expect(page.getByTestId('signed-in-person')).toContainText(operator.name);
    await expect(page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Stations' })).toHaveCount(0);
    await screenshotAt(page, 'station-home');
    await screenshotAt(page, 'station-home', { width: 1280, height: 800 });
  });

  await test.step('the operator may not open the lead\'s Stations screen', async () => {
    const stations = await page.request.get('/api/stations');
    expect(stations.status()).toBe(403);
  });

  await test.step('sign out: the tablet goes back to the PIN pad for the next person', async () => {
    await page.getByRole('button', { name: 'Sign out', exact: true }).click();
    await expect(page).toHaveURL(/\/(station|sign-in)$/);
  });
});
