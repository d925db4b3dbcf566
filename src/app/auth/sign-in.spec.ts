import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import { Router } from '@angular/router';
import { BROWSER_STORAGE } from '../core/browser-storage';
import { MemoryStorage } from '../core/memory-storage';
import { DEVICE_TOKEN_KEY } from './device-pairing';
import { Session } from './session';
import { SignIn } from './sign-in';
import { screenTestProviders } from '../core/screen-testing';

describe('SignIn', () => {
  let fixture: ComponentFixture<SignIn>;
  let http: HttpTestingController;
  let navigate: jest.SpyInstance;
  let storage: MemoryStorage;

  async function render(): Promise<void> {
    TestBed.configureTestingModule({
      imports: [SignIn],
      providers: [
        ...screenTestProviders(),
        { provide: BROWSER_STORAGE, useValue: storage },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    navigate = jest.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    fixture = TestBed.createComponent(SignIn);
    await fixture.whenStable();
  }

  function element(): HTMLElement {
    return fixture.nativeElement as HTMLElement;
  }

  function type(selector: string, value: string): void {
    const input = element().querySelector<HTMLInputElement>(selector)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function submit(): Promise<void> {
    element().querySelector<HTMLButtonElement>('button[type=submit]')!.click();
    await fixture.whenStable();
  }

  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  }

  beforeEach(() => {
    storage = new MemoryStorage();
  });

  afterEach(() => http.verify());

  it("shows the hub's sentence under the form when the hub answers 401", async () => {
    await render();
    type('input[type=email]', 'lead@example.test');
    type('input[type=password]', 'wrong');
    await submit();

    const request = http.expectOne('/api/auth/login');
    expect(request.request.body).toEqual({ email: 'lead@example.test', password: 'wrong' });
    request.flush({ error: 'That e-mail and password do not match.' }, { status: 401, statusText: 'Unauthorized' });
    await settle();

    const problem = element().querySelector('[data-testid=sign-in-problem]');
    expect(problem?.textContent).toContain('That e-mail and password do not match.');
    expect(navigate).not.toHaveBeenCalled();
    expect(TestBed.inject(Session).signedIn()).toBe(false);
  });

  it('signs in and goes to the home route on success', async () => {
    await render();
    type('input[type=email]', 'lead@example.test');
    type('input[type=password]', 'right');
    await submit();

    http.expectOne('/api/auth/login').flush({
      user: { id: 2, name: 'Rosa Quill', email: 'lead@example.test', role: 'lead' },
      station: null,
    });
    await settle();

    expect(TestBed.inject(Session).user()?.name).toBe('Rosa Quill');
    expect(navigate).toHaveBeenCalledWith('/');
    expect(element().querySelector('[data-testid=sign-in-problem]')).toBeNull();
  });

  it('sends nothing while the e-mail is missing and says what is needed', async () => {
    await render();
    type('input[type=password]', 'right');
    await submit();

    http.expectNone('/api/auth/login');
    expect(element().textContent).toContain('Enter your e-mail address.');
  });

  it('offers the PIN sign-in only on a tablet that holds a device token', async () => {
    storage.setItem(DEVICE_TOKEN_KEY, 'tok-1');
    await render();

    expect(element().querySelector('[data-testid=pin-link]')?.textContent).toContain('Station sign-in with PIN');
  });

  it('shows no PIN sign-in on an unpaired browser', async () => {
    await render();

    expect(element().querySelector('[data-testid=pin-link]')).toBeNull();
  });
});
