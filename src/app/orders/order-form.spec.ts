import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import { Router } from '@angular/router';
import { OrderForm } from './order-form';
import { screenTestProviders } from '../core/screen-testing';

describe('OrderForm', () => {
  let fixture: ComponentFixture<OrderForm>;
  let http: HttpTestingController;
  let navigate: jest.SpyInstance;

  const element = () => fixture.nativeElement as HTMLElement;
  const byTestId = (id: string) => element().querySelector<HTMLElement>(`[data-testid=${id}]`);

  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  }

  function type(input: HTMLInputElement, text: string): void {
    input.value = text;
    input.dispatchEvent(new Event('input'));
  }

  async function fillNewCustomer(): Promise<void> {
    byTestId('new-customer-toggle')!.querySelector('button')!.click();
    await settle();
    type(element().querySelector('input[formcontrolname=name]')!, 'Hollinford Otters Swim Club');
    type(element().querySelector('input[formcontrolname=email]')!, 'otters@club.invalid');
  }

  beforeEach(async () => {
    TestBed.configureTestingModule({
      imports: [OrderForm],
      providers: [
        ...screenTestProviders(),
      ],
    });
    http = TestBed.inject(HttpTestingController);
    navigate = jest.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    fixture = TestBed.createComponent(OrderForm);
    await settle();
  });

  afterEach(() => http.verify());

  it('says the due date is missing next to the date field and sends nothing', async () => {
    await fillNewCustomer();
    byTestId('save-order')!.click();
    await settle();

    expect(byTestId('error-dueDate')?.textContent?.trim()).toBe('Pick the date the order is due.');
    http.expectNone('/api/orders');
  });

  it('asks for a customer from the list when none is picked', async () => {
    byTestId('save-order')!.click();
    await settle();

    expect(byTestId('error-customer')?.textContent).toContain('Pick a customer from the list');
  });

  it('sends a new customer and the due time at 15:00 local time', async () => {
    await fillNewCustomer();
    type(byTestId('due-date') as HTMLInputElement, '2031-05-14T00:00');
    byTestId('save-order')!.click();
    await settle();

    const request = http.expectOne({ method: 'POST', url: '/api/orders' });
    expect(request.request.body).toEqual({
      newCustomer: { name: 'Hollinford Otters Swim Club', contactName: '', email: 'otters@club.invalid', phone: '' },
      dueAt: new Date(2031, 4, 14, 15, 0).toISOString(),
      notes: '',
    });
    request.flush({ id: 12 });
    await settle();
    expect(navigate).toHaveBeenCalledWith(['/orders', 12]);
  });

  it('puts the hub\'s sentence next to the field its path names', async () => {
    await fillNewCustomer();
    type(byTestId('due-date') as HTMLInputElement, '2031-05-14T00:00');
    byTestId('save-order')!.click();
    await settle();

    http.expectOne({ method: 'POST', url: '/api/orders' }).flush(
      { error: 'Check the order.', details: [{ path: ['newCustomer', 'email'], message: 'That e-mail address cannot receive mail.' }] },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();

    expect(byTestId('error-email')?.textContent?.trim()).toBe('That e-mail address cannot receive mail.');
    expect(byTestId('error-dueDate')).toBeNull();
    expect((element().querySelector('input[formcontrolname=name]') as HTMLInputElement).value).toBe('Hollinford Otters Swim Club');
  });
});
