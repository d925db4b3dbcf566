import { ComponentFixture, TestBed } from '@angular/core/testing';
import { importProvidersFrom, provideZonelessChangeDetection } from '@angular/core';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { Role, Session } from '../auth/session';
import { BROWSER_STORAGE } from '../core/browser-storage';
import { MemoryStorage } from '../core/memory-storage';
import { PeoplePage } from './people-page';

const PEOPLE = [
  { id: 1, name: 'Ines Quarry', email: 'ines@shop.example', role: 'owner', active: true, hasPin: false, hasPassword: true },
  { id: 7, name: 'Dale Furrow', email: null, role: 'operator', active: true, hasPin: true, hasPassword: false },
];

describe('PeoplePage', () => {
  let fixture: ComponentFixture<PeoplePage>;
  let http: HttpTestingController;

  const element = () => fixture.nativeElement as HTMLElement;
  const button = (label: string) =>
    Array.from(element().querySelectorAll('button')).find((b) => b.textContent?.trim().startsWith(label)) as HTMLButtonElement | undefined;
  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  }
  function type(selector: string, value: string): void {
    const input = element().querySelector<HTMLInputElement>(selector)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function renderAs(role: Role): Promise<void> {
    TestBed.configureTestingModule({
      imports: [PeoplePage],
      providers: [
        provideZonelessChangeDetection(),
        provideHttpClient(),
        provideHttpClientTesting(),
        importProvidersFrom(MatIconTestingModule),
        { provide: BROWSER_STORAGE, useValue: new MemoryStorage() },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    const signedIn = TestBed.inject(Session).signIn('x@shop.example', 'pw');
    http.expectOne('/api/auth/login').flush({ user: { id: 1, name: 'Ines Quarry', email: 'x@shop.example', role }, station: null });
    await signedIn;
    fixture = TestBed.createComponent(PeoplePage);
    fixture.detectChanges();
    http.expectOne('/api/people').flush(PEOPLE);
    await settle();
  }

  afterEach(() => http.verify());

  it('lists each person with how they sign in', async () => {
    await renderAs('owner');
    const cards = Array.from(element().querySelectorAll('[data-testid=person]'), (card) => card.textContent ?? '');
    expect(cards[0]).toContain('ines@shop.example');
    expect(cards[1]).toContain('Signs in at a station with a PIN');
  });

  it('adds an operator with a PIN and confirms in a sentence', async () => {
    await renderAs('owner');
    button('Add a person')!.click();
    await settle();
    type('input[formcontrolname=name]', 'Wren Hale');
    type('input[formcontrolname=pin]', '4826');
    button('Save person')!.click();
    const sent = http.expectOne({ method: 'POST', url: '/api/people' });
    expect(sent.request.body).toEqual({ role: 'operator', name: 'Wren Hale', pin: '4826' });
    sent.flush({ id: 9, name: 'Wren Hale', email: null, role: 'operator', active: true, hasPin: true, hasPassword: false });
    await settle();
    http.expectOne('/api/people').flush(PEOPLE);
    await settle();
    expect(element().querySelector('[data-testid=people-confirmation]')?.textContent).toContain('Wren Hale can now sign in at any station with their PIN.');
  });

  it('says what is missing and sends nothing when an operator has no PIN', async () => {
    await renderAs('owner');
    button('Add a person')!.click();
    await settle();
    type('input[formcontrolname=name]', 'Wren Hale');
    button('Save person')!.click();
    await settle();
    expect(element().querySelector('[data-testid=add-problem]')?.textContent).toContain('Give the operator a PIN of 4 to 6 digits.');
  });

  it('shows the hub\'s sentence when the PIN is taken', async () => {
    await renderAs('owner');
    button('Add a person')!.click();
    await settle();
    type('input[formcontrolname=name]', 'Wren Hale');
    type('input[formcontrolname=pin]', '2468');
    button('Save person')!.click();
    http.expectOne('/api/people').flush({ error: 'Another operator already uses that PIN. Choose a different one.' }, { status: 409, statusText: 'Conflict' });
    await settle();
    expect(element().querySelector('[data-testid=add-problem]')?.textContent).toContain('Another operator already uses that PIN.');
  });

  it('lets a lead set an operator\'s PIN but not add people or stop sign-ins', async () => {
    await renderAs('lead');
    expect(button('Add a person')).toBeUndefined();
    expect(button('Stop sign-in')).toBeUndefined();
    expect(button('Set PIN')).toBeDefined();
    expect(button('Set password')).toBeUndefined();
  });
});
