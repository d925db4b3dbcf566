import { ComponentFixture, TestBed } from '@angular/core/testing';
import { importProvidersFrom, provideZonelessChangeDetection } from '@angular/core';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Clipboard } from '@angular/cdk/clipboard';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { WallDisplays } from './wall-displays';
import { readDrawnQr } from '../orders/bag-qr-testing';

const DISPLAYS = [{ id: 4, name: 'Spec wall by the presses', createdAt: '2030-05-01T08:00:00Z' }];
const NEW_TOKEN = 'spec-new-display-token-abcdefghij';

describe('WallDisplays', () => {
  let fixture: ComponentFixture<WallDisplays>;
  let http: HttpTestingController;
  const copy = jest.fn();

  function element(): HTMLElement {
    return fixture.nativeElement as HTMLElement;
  }

  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  }

  function button(label: string): HTMLButtonElement {
    const found = Array.from(element().querySelectorAll('button')).find((b) => b.textContent?.trim().includes(label));
    if (!found) throw new Error(`No button "${label}"`);
    return found;
  }

  async function typeName(name: string): Promise<void> {
    const input = element().querySelector<HTMLInputElement>('input')!;
    input.value = name;
    input.dispatchEvent(new Event('input'));
    await settle();
  }

  beforeEach(async () => {
    copy.mockReset().mockReturnValue(true);
    TestBed.configureTestingModule({
      imports: [WallDisplays],
      providers: [
        provideZonelessChangeDetection(),
        provideHttpClient(),
        provideHttpClientTesting(),
        importProvidersFrom(MatIconTestingModule),
        { provide: Clipboard, useValue: { copy } },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(WallDisplays);
    fixture.detectChanges();
    http.expectOne({ method: 'GET', url: '/api/displays' }).flush(DISPLAYS);
    await settle();
  });

  afterEach(() => http.verify());

  it('lists the active wall displays', () => {
    const rows = Array.from(element().querySelectorAll('[data-testid=wall-display]'), (row) => row.textContent ?? '');

    expect(rows).toHaveLength(1);
    expect(rows[0]).toContain('Spec wall by the presses');
  });

  it('adds a display and shows its link once, as text, as a QR code and for copying', async () => {
    await typeName('Spec wall by the door');
    button('Add a wall display').click();
    const post = http.expectOne({ method: 'POST', url: '/api/displays' });
    expect(post.request.body).toEqual({ name: 'Spec wall by the door' });
    post.flush({ id: 5, name: 'Spec wall by the door', deviceToken: NEW_TOKEN });
    await settle();
    http.expectOne('/api/displays').flush([...DISPLAYS, { id: 5, name: 'Spec wall by the door', createdAt: '2030-05-14T09:00:00Z' }]);
    await settle();

    const link = `${location.origin}/display#token=${NEW_TOKEN}`;
    expect(element().querySelector('[data-testid=display-link]')?.textContent?.trim()).toBe(link);
    // jsQR decodes ISO/IEC 18004 symbols independently of the qrcode package that drew this one.
    expect(readDrawnQr(element().querySelector<SVGSVGElement>('[data-testid=new-display-link] svg')!)).toBe(link);
    button('Copy the link').click();
    await settle();
    expect(copy).toHaveBeenCalledWith(link);
    expect(button('Copied')).toBeTruthy();

    button('Done').click();
    await settle();
    expect(element().querySelector('[data-testid=display-link]')).toBeNull();
    expect(element().textContent).not.toContain(NEW_TOKEN);
  });

  it('says next to the name field that a display needs a name, and sends nothing', async () => {
    await typeName('   ');
    button('Add a wall display').click();
    await settle();

    expect(element().querySelector('[data-testid=display-name-problem]')?.textContent?.trim()).toBe(
      'Give the display a name, e.g. "Wall by the presses".',
    );
    http.expectNone({ method: 'POST', url: '/api/displays' });
  });

  it('shows the hub\'s sentence when it refuses the new display', async () => {
    await typeName('Spec wall');
    button('Add a wall display').click();
    http.expectOne({ method: 'POST', url: '/api/displays' }).flush(
      { error: 'Your role cannot add wall displays.' },
      { status: 403, statusText: 'Forbidden' },
    );
    await settle();

    expect(element().querySelector('[data-testid=display-name-problem]')?.textContent?.trim()).toBe('Your role cannot add wall displays.');
    expect(element().querySelector('[data-testid=display-link]')).toBeNull();
  });

  it('revokes a display only after the lead confirms it', async () => {
    button('Revoke').click();
    await settle();
    http.expectNone({ method: 'DELETE', url: '/api/displays/4' });
    expect(element().textContent).toContain('Revoke Spec wall by the presses? Its screen stops showing the board');

    element().querySelector<HTMLButtonElement>('[data-testid=confirm-revoke]')!.click();
    http.expectOne({ method: 'DELETE', url: '/api/displays/4' }).flush(null, { status: 204, statusText: 'No Content' });
    await settle();
    http.expectOne('/api/displays').flush([]);
    await settle();

    expect(element().querySelector('[data-testid=display-confirmation]')?.textContent?.trim()).toBe(
      'Spec wall by the presses no longer shows the floor board. Its link does not work any more.',
    );
    expect(element().querySelectorAll('[data-testid=wall-display]')).toHaveLength(0);
  });

  it('keeps the display when the lead changes their mind', async () => {
    button('Revoke').click();
    await settle();
    button('Keep it').click();
    await settle();

    http.expectNone({ method: 'DELETE', url: '/api/displays/4' });
    expect(element().querySelectorAll('[data-testid=wall-display]')).toHaveLength(1);
  });
});
