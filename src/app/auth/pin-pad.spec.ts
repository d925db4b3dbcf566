import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import { Router } from '@angular/router';
import { BROWSER_STORAGE } from '../core/browser-storage';
import { MemoryStorage } from '../core/memory-storage';
import { DEVICE_TOKEN_KEY } from './device-pairing';
import { PinPad } from './pin-pad';
import { Session } from './session';
import { screenTestProviders } from '../core/screen-testing';

const STATION = { id: 4, name: 'Press 1', kind: 'press' };
const OPERATORS = [
  { id: 11, name: 'Tam Okafor' },
  { id: 12, name: 'June Varga' },
];

describe('PinPad', () => {
  let fixture: ComponentFixture<PinPad>;
  let http: HttpTestingController;
  let navigate: jest.SpyInstance;
  let storage: MemoryStorage;

  function element(): HTMLElement {
    return fixture.nativeElement as HTMLElement;
  }

  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  }

  async function render(): Promise<void> {
    TestBed.configureTestingModule({
      imports: [PinPad],
      providers: [
        ...screenTestProviders(),
        { provide: BROWSER_STORAGE, useValue: storage },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    navigate = jest.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    fixture = TestBed.createComponent(PinPad);
    fixture.detectChanges();
  }

  async function renderPairedStation(): Promise<void> {
    storage.setItem(DEVICE_TOKEN_KEY, 'tok-press-1');
    await render();
    const request = http.expectOne('/api/auth/device');
    expect(request.request.body).toEqual({ deviceToken: 'tok-press-1' });
    request.flush({ station: STATION, operators: OPERATORS });
    await settle();
  }

  function buttonLabelled(text: string): HTMLButtonElement {
    const buttons = Array.from(element().querySelectorAll<HTMLButtonElement>('button'));
    const found = buttons.find(
      (button) => button.textContent?.trim() === text || button.getAttribute('aria-label') === text,
    );
    if (!found) {
      throw new Error(`No button labelled ${text}`);
    }
    return found;
  }

  async function tap(text: string): Promise<void> {
    buttonLabelled(text).click();
    await fixture.whenStable();
  }

  async function tapDigits(digits: string): Promise<void> {
    for (const digit of digits) {
      await tap(digit);
    }
  }

  function filledDots(): number {
    return element().querySelectorAll('[data-testid=pin-dots] .dot.filled').length;
  }

  beforeEach(() => {
    storage = new MemoryStorage();
  });

  afterEach(() => http.verify());

  it('shows the station name and the operators who can sign in', async () => {
    await renderPairedStation();

    expect(element().querySelector('[data-testid=station-name]')?.textContent).toContain('Press 1');
    expect(element().textContent).toContain('Press station');
    expect(buttonLabelled('Tam Okafor')).toBeTruthy();
    expect(buttonLabelled('June Varga')).toBeTruthy();
  });

  it('shows typed digits as dots, never as digits', async () => {
    await renderPairedStation();
    await tap('Tam Okafor');

    await tapDigits('739');

    expect(filledDots()).toBe(3);
    expect(element().querySelector('[data-testid=pin-dots]')?.textContent?.trim()).toBe('');
  });

  it('takes no more than six digits', async () => {
    await renderPairedStation();
    await tap('Tam Okafor');

    await tapDigits('12345678');
    await tap('Enter');

    const request = http.expectOne('/api/auth/pin');
    expect(request.request.body.pin).toBe('123456');
    request.flush({ error: 'x' }, { status: 401, statusText: 'Unauthorized' });
    await settle();
  });

  it('keeps Enter off until four digits are typed', async () => {
    await renderPairedStation();
    await tap('Tam Okafor');

    await tapDigits('123');
    expect(element().querySelector<HTMLButtonElement>('[data-testid=pin-enter]')?.disabled).toBe(true);

    await tapDigits('4');
    expect(element().querySelector<HTMLButtonElement>('[data-testid=pin-enter]')?.disabled).toBe(false);
  });

  it('sends the device token, the PIN and the chosen operator, then goes home', async () => {
    await renderPairedStation();
    await tap('June Varga');
    await tapDigits('2468');
    await tap('Enter');

    const request = http.expectOne('/api/auth/pin');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({ deviceToken: 'tok-press-1', pin: '2468', userId: 12 });
    request.flush({ user: { id: 12, name: 'June Varga', email: '', role: 'operator' }, station: STATION });
    await settle();

    expect(TestBed.inject(Session).station()?.name).toBe('Press 1');
    expect(navigate).toHaveBeenCalledWith('/');
  });

  it("clears the pad and shows the hub's sentence on a wrong PIN", async () => {
    await renderPairedStation();
    await tap('Tam Okafor');
    await tapDigits('0000');
    await tap('Enter');

    http.expectOne('/api/auth/pin').flush({ error: 'That PIN is not right. Try again.' }, { status: 401, statusText: 'Unauthorized' });
    await settle();

    expect(filledDots()).toBe(0);
    expect(element().querySelector('[data-testid=pin-problem]')?.textContent).toContain('That PIN is not right. Try again.');
    expect(navigate).not.toHaveBeenCalled();
  });

  it("shows the hub's sentence when there were too many attempts", async () => {
    await renderPairedStation();
    await tap('Tam Okafor');
    await tapDigits('1111');
    await tap('Enter');

    http.expectOne('/api/auth/pin').flush(
      { error: 'Too many PIN attempts. Wait five minutes.' },
      { status: 429, statusText: 'Too Many Requests' },
    );
    await settle();

    expect(element().querySelector('[data-testid=pin-problem]')?.textContent).toContain('Too many PIN attempts. Wait five minutes.');
  });

  it('takes digits, Backspace and Enter from a keyboard', async () => {
    await renderPairedStation();
    await tap('Tam Okafor');

    for (const key of ['5', '5', '9', 'Backspace', '1', '2', 'Enter']) {
      document.dispatchEvent(new KeyboardEvent('keydown', { key }));
    }
    await fixture.whenStable();

    expect(http.expectOne('/api/auth/pin').request.body.pin).toBe('5512');
  });

  it('says the tablet is not paired any more when the hub no longer knows its token', async () => {
    storage.setItem(DEVICE_TOKEN_KEY, 'tok-old');
    await render();
    http.expectOne('/api/auth/device').flush({ error: 'Unknown device.' }, { status: 401, statusText: 'Unauthorized' });
    await settle();

    expect(element().querySelector('[data-testid=unpaired]')?.textContent).toContain('not paired with a station any more');
    expect(element().querySelector('a[href="/sign-in"]')).not.toBeNull();
    expect(storage.getItem(DEVICE_TOKEN_KEY)).toBeNull();
  });

  it('asks the hub nothing on a tablet without a device token', async () => {
    await render();
    await fixture.whenStable();

    http.expectNone('/api/auth/device');
    expect(element().querySelector('[data-testid=unpaired]')).not.toBeNull();
  });
});
