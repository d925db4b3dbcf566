import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import type { ShopSettings, ShopSettingsInput } from '../../shared/shop-contract';
import { Role, Session } from '../auth/session';
import { screenTestProviders } from '../core/screen-testing';
import { ShopSettingsPage } from './shop-settings-page';
import { DEMO_SHOP } from '../../../seeds/data/demo-shop';

// The demo shop (an invented business), as the hub would answer it.
const STORED: ShopSettings = { ...DEMO_SHOP, updatedAt: '2026-05-11T08:00:00.000Z' };

describe('ShopSettingsPage', () => {
  let fixture: ComponentFixture<ShopSettingsPage>;
  let http: HttpTestingController;

  const page = () => fixture.nativeElement as HTMLElement;
  const byTestId = <T extends HTMLElement = HTMLElement>(id: string) => page().querySelector<T>(`[data-testid=${id}]`);
  const input = (id: string) => byTestId<HTMLInputElement>(id)!;
  const saveButton = () => byTestId<HTMLButtonElement>('shop-save');

  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  }

  async function type(id: string, value: string): Promise<void> {
    const field = input(id);
    field.value = value;
    field.dispatchEvent(new Event('input'));
    await settle();
  }

  async function openAs(role: Role): Promise<void> {
    TestBed.configureTestingModule({ imports: [ShopSettingsPage], providers: screenTestProviders() });
    http = TestBed.inject(HttpTestingController);
    const signedIn = TestBed.inject(Session).signIn('x@brambleyard.example', 'pw');
    http.expectOne('/api/auth/login').flush({ user: { id: 1, name: 'Maren Hollis', email: 'x@brambleyard.example', role }, station: null });
    await signedIn;
    fixture = TestBed.createComponent(ShopSettingsPage);
    fixture.detectChanges();
  }

  async function openWithSettingsAs(role: Role): Promise<void> {
    await openAs(role);
    http.expectOne({ method: 'GET', url: '/api/shop' }).flush(STORED);
    await settle();
  }

  function pressed(day: number): string | null {
    return byTestId(`day-${day}`)!.getAttribute('aria-pressed');
  }

  afterEach(() => http.verify());

  it('shows the stored settings, Monday to Friday pressed, and the clock of the shop time zone', async () => {
    await openWithSettingsAs('owner');

    expect(input('shop-name').value).toBe('Bramble Yard Apparel');
    expect(byTestId<HTMLTextAreaElement>('shop-address')!.value).toBe('Unit 4, Bramble Yard, Tanner Row, Hollinford');
    expect(input('shop-email').value).toBe('hello@brambleyard.example');
    expect(input('shift-start').value).toBe('07:00');
    expect(input('shift-end').value).toBe('15:30');
    expect(input('time-zone').value).toBe('Europe/London');
    expect(['cut', 'weed', 'press', 'pack'].map((kind) => input(`rate-${kind}`).value)).toEqual(['120', '30', '45', '90']);
    expect(input('bag-max-pieces').value).toBe('24');
    expect(input('heat-limit').value).toBe('45');
    expect([1, 2, 3, 4, 5, 6, 7].map(pressed)).toEqual(['true', 'true', 'true', 'true', 'true', 'false', 'false']);
    expect(byTestId('day-6')!.getAttribute('aria-label')).toBe('Saturday');
    expect(byTestId('units-imperial')!.classList).toContain('mat-button-toggle-checked');
    expect(byTestId('zone-clock')!.textContent).toMatch(/(Mon|Tues|Wednes|Thurs|Fri|Satur|Sun)day \d\d:\d\d/);
    expect(byTestId('shift-midnight')).toBeNull();
    expect(page().textContent).toContain("customers' ready-for-pickup mail");
    expect(page().textContent).toContain("follow the film supplier's instructions and your local workplace safety rules");
  });

  it('keeps Save shut until something changes, and Undo changes puts the stored values back', async () => {
    await openWithSettingsAs('owner');
    expect(saveButton()!.disabled).toBe(true);

    await type('shop-phone', '01632 960999');
    expect(saveButton()!.disabled).toBe(false);

    byTestId<HTMLButtonElement>('shop-undo')!.click();
    await settle();
    expect(input('shop-phone').value).toBe('01632 960412');
    expect(saveButton()!.disabled).toBe(true);
  });

  it('sends Monday to Saturday after Saturday is pressed and saved, then confirms and shows what was stored', async () => {
    await openWithSettingsAs('owner');

    byTestId<HTMLButtonElement>('day-6')!.click();
    await settle();
    expect(pressed(6)).toBe('true');
    saveButton()!.click();

    const sent = http.expectOne({ method: 'PUT', url: '/api/shop' });
    const { updatedAt: _stamp, ...unchanged } = STORED;
    expect(sent.request.body).toEqual({ ...unchanged, workingDays: [1, 2, 3, 4, 5, 6] } satisfies ShopSettingsInput);
    sent.flush({ ...STORED, workingDays: [1, 2, 3, 4, 5, 6], updatedAt: '2026-05-12T09:00:00.000Z' });
    await settle();

    expect(byTestId('shop-confirmation')!.textContent).toContain('Shop settings saved.');
    expect(pressed(6)).toBe('true');
    expect(saveButton()!.disabled).toBe(true);
  });

  it('adds a closed day with its note, removes another, and sends the list in date order', async () => {
    await openWithSettingsAs('owner');
    const listed = () => [...page().querySelectorAll('[data-testid=closed-day]')].map((row) => row.getAttribute('data-date'));
    expect(listed()).toEqual(['2026-12-25', '2026-12-28', '2027-12-27', '2027-12-28']);

    await type('closed-date', '2027-01-01');
    await type('closed-note', "New Year's Day");
    byTestId<HTMLButtonElement>('closed-add')!.click();
    await settle();
    page().querySelector<HTMLButtonElement>('button[aria-label="Remove Mon 27 Dec 2027"]')!.click();
    await settle();
    expect(listed()).toEqual(['2026-12-25', '2026-12-28', '2027-01-01', '2027-12-28']);

    saveButton()!.click();
    const sent = http.expectOne({ method: 'PUT', url: '/api/shop' });
    expect(sent.request.body.closedDays).toEqual([
      { date: '2026-12-25', note: 'Christmas Day' },
      { date: '2026-12-28', note: 'Boxing Day (substitute day)' },
      { date: '2027-01-01', note: "New Year's Day" },
      { date: '2027-12-28', note: 'Boxing Day (substitute day)' },
    ]);
    sent.flush({ ...STORED, closedDays: sent.request.body.closedDays });
    await settle();
    expect(byTestId('shop-confirmation')!.textContent).toContain('Shop settings saved.');
  });

  it('refuses a closed day that is already listed, with a sentence beside the date', async () => {
    await openWithSettingsAs('owner');

    await type('closed-date', '2026-12-25');
    byTestId<HTMLButtonElement>('closed-add')!.click();
    await settle();

    expect(byTestId('problem-closed-add')!.textContent).toContain('2026-12-25 is already a closed day.');
    expect(page().querySelectorAll('[data-testid=closed-day]')).toHaveLength(4);
    expect(saveButton()!.disabled).toBe(true);
  });

  it('shows a sentence beside the time zone and sends nothing for a zone the tablet does not know', async () => {
    await openWithSettingsAs('owner');

    await type('time-zone', 'Mars/Olympus');
    expect(byTestId('zone-clock')).toBeNull();
    saveButton()!.click();
    await settle();

    http.expectNone({ method: 'PUT', url: '/api/shop' });
    const problem = byTestId('problem-timeZone')!;
    expect(problem.textContent).toContain('“Mars/Olympus” is not a time zone this tablet knows.');
    expect(problem.closest('.field')!.contains(input('time-zone'))).toBe(true);
    expect(input('time-zone').getAttribute('aria-describedby')).toContain(problem.id);
    expect(input('time-zone').value).toBe('Mars/Olympus');
  });

  it('brings the sentence about a field further down the page into view when Save finds it', async () => {
    await openWithSettingsAs('owner');
    const shown: Element[] = [];
    // jsdom lays nothing out, so it has no scrollIntoView of its own: record which element asks to be shown.
    Element.prototype.scrollIntoView = function (this: Element) {
      shown.push(this);
    };

    await type('rate-pack', '0');
    saveButton()!.click();
    await settle();

    expect(shown).toEqual([byTestId('problem-ratePack')]);
    delete (Element.prototype as Partial<Element>).scrollIntoView;
  });

  it('puts each of the hub refusals beside the field it names and keeps what the owner typed', async () => {
    await openWithSettingsAs('owner');

    await type('shop-email', 'orders@brambleyard.example');
    await type('heat-limit', '60');
    saveButton()!.click();
    http.expectOne({ method: 'PUT', url: '/api/shop' }).flush(
      {
        error: 'The shop settings were not saved.',
        details: [
          { path: 'email', message: 'The mail service will not send from this address.' },
          { path: 'heatExposureLimitS', message: 'Check the limit against the film supplier sheet.' },
        ],
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();

    expect(byTestId('problem-email')!.textContent).toContain('The mail service will not send from this address.');
    expect(byTestId('problem-heatExposureLimitS')!.textContent).toContain('Check the limit against the film supplier sheet.');
    expect(byTestId('problem-timeZone')).toBeNull();
    expect(byTestId('shop-save-problem')!.textContent).toContain('The shop settings were not saved.');
    expect(input('shop-email').value).toBe('orders@brambleyard.example');
    expect(input('heat-limit').value).toBe('60');
    expect(byTestId('shop-confirmation')).toBeNull();
  });

  it('sends each stage its own standard rate and puts a refusal of one beside that stage', async () => {
    await openWithSettingsAs('owner');

    await type('rate-weed', '25');
    saveButton()!.click();
    const sent = http.expectOne({ method: 'PUT', url: '/api/shop' });
    expect(sent.request.body.standardRates).toEqual({ cut: 120, weed: 25, press: 45, pack: 90 });
    sent.flush(
      { error: 'Some of the settings form is missing or not valid.', details: [{ path: 'standardRates.weed', message: 'The standard rate at weed is too low for this shop.' }] },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();

    expect(byTestId('problem-rateWeed')!.textContent).toContain('The standard rate at weed is too low for this shop.');
    expect(byTestId('problem-rateCut')).toBeNull();
    expect(input('rate-weed').value).toBe('25');
  });

  it('says the hub cannot be reached and keeps what was typed when a save does not get through', async () => {
    await openWithSettingsAs('owner');

    await type('shop-name', 'Bramble Yard Apparel & Print');
    saveButton()!.click();
    http.expectOne({ method: 'PUT', url: '/api/shop' }).error(new ProgressEvent('error'), { status: 0 });
    await settle();

    expect(byTestId('shop-save-problem')!.textContent).toContain('The hub cannot be reached, so nothing was saved');
    expect(input('shop-name').value).toBe('Bramble Yard Apparel & Print');
    expect(saveButton()!.disabled).toBe(false);
  });

  it('says the screen needs the hub when the settings cannot be loaded, and loads them on Try again', async () => {
    await openAs('owner');
    http.expectOne('/api/shop').error(new ProgressEvent('error'), { status: 0 });
    await settle();
    expect(byTestId('shop-load-problem')!.textContent).toContain('this screen works only while the hub answers');
    expect(byTestId('shop-name')).toBeNull();

    Array.from(page().querySelectorAll('button')).find((b) => b.textContent?.includes('Try again'))!.click();
    http.expectOne('/api/shop').flush(STORED);
    await settle();
    expect(byTestId('shop-load-problem')).toBeNull();
    expect(input('shop-name').value).toBe('Bramble Yard Apparel');
  });

  it('shows a lead the same values with every field shut, a sentence saying only the owner changes them, and no Save', async () => {
    await openWithSettingsAs('lead');

    expect(input('shop-name').value).toBe('Bramble Yard Apparel');
    expect(byTestId('shop-read-only')!.textContent).toContain('Only the owner can change the shop settings.');
    for (const id of ['shop-name', 'shop-phone', 'shop-email', 'shift-start', 'shift-end', 'time-zone', 'rate-cut', 'rate-weed', 'rate-press', 'rate-pack', 'bag-max-pieces', 'heat-limit']) {
      expect(`${id} ${input(id).disabled}`).toBe(`${id} true`);
    }
    expect(byTestId<HTMLTextAreaElement>('shop-address')!.disabled).toBe(true);
    expect(byTestId<HTMLButtonElement>('day-6')!.disabled).toBe(true);
    expect(byTestId('units-metric')!.querySelector('button')!.disabled).toBe(true);
    expect(saveButton()).toBeNull();
    expect(byTestId('shop-undo')).toBeNull();
  });

  it('says the shift runs past midnight for a 22:00 to 06:00 shift', async () => {
    await openWithSettingsAs('owner');

    await type('shift-start', '22:00');
    await type('shift-end', '06:00');

    expect(byTestId('shift-midnight')!.textContent).toContain('The shift runs past midnight and ends the next day.');
    await type('shift-end', '23:30');
    expect(byTestId('shift-midnight')).toBeNull();
  });

  it('sends metric units when the owner picks metric', async () => {
    await openWithSettingsAs('owner');

    byTestId('units-metric')!.querySelector('button')!.click();
    await settle();
    saveButton()!.click();

    const sent = http.expectOne({ method: 'PUT', url: '/api/shop' });
    expect(sent.request.body.units).toBe('metric');
    sent.flush({ ...STORED, units: 'metric' });
    await settle();
    expect(byTestId('units-metric')!.classList).toContain('mat-button-toggle-checked');
  });
});
