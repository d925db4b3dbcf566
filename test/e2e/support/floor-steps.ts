import { expect, request as playwrightRequest, type APIRequestContext, type Page } from '@playwright/test';
import { DEMO_ACCOUNTS } from '../../../seeds/data/demo-accounts';
import { e2eBaseUrl } from './e2e-hub';

type Operator = (typeof DEMO_ACCOUNTS.operators)[number];

/** The demo lead (or owner) signs in on the sign-in page. */
export async function signInWithEmail(page: Page, who: 'lead' | 'owner' = 'lead'): Promise<void> {
  const { email, password, name } = DEMO_ACCOUNTS[who];
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('signed-in-person')).toContainText(name);
}

/** Types a PIN on the station PIN pad's big keys. */
export async function typePin(page: Page, pin: string): Promise<void> {
  for (const digit of pin) await page.getByRole('button', { name: digit, exact: true }).click();
}

/** On the Stations screen, the signed-in lead pairs this tablet with a station and opens its PIN pad. */
export async function pairThisTabletAndHandOver(page: Page, stationName: string): Promise<void> {
  await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: 'Stations' }).click();
  const card = page.getByTestId('station-card').filter({ has: page.getByRole('heading', { name: stationName, exact: true }) });
  await card.getByRole('button', { name: 'Pair this tablet' }).click();
  await page.getByRole('button', { name: 'Sign out and open the PIN pad' }).click();
  await expect(page.getByTestId('station-name')).toHaveText(stationName);
}

/** On the PIN pad, the operator taps their name and types their PIN. */
export async function signInWithPin(page: Page, operator: Operator): Promise<void> {
  await page.getByRole('button', { name: operator.name }).click();
  await typePin(page, operator.pin);
  await page.getByTestId('pin-enter').click();
  await expect(page.getByTestId('signed-in-person')).toContainText(operator.name);
}

/** The whole hand-over: the lead signs in, pairs this tablet with the station, and the operator signs in there. */
export async function operatorAtStation(page: Page, stationName: string, operator: Operator): Promise<void> {
  await signInWithEmail(page, 'lead');
  await pairThisTabletAndHandOver(page, stationName);
  await signInWithPin(page, operator);
}

/** The demo lead's own API session, apart from the tablet's, for checking what the hub holds. */
export async function leadApi(): Promise<APIRequestContext> {
  const lead = await playwrightRequest.newContext({ baseURL: e2eBaseUrl(), extraHTTPHeaders: { Origin: e2eBaseUrl() } });
  const login = await lead.post('/api/auth/login', { data: { email: DEMO_ACCOUNTS.lead.email, password: DEMO_ACCOUNTS.lead.password } });
  expect(login.ok()).toBe(true);
  return lead;
}
