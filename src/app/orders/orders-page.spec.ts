import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController, TestRequest } from '@angular/common/http/testing';
import type { OrderListItem, OrderPage } from '../../shared/intake-contract';
import { OrdersPage } from './orders-page';
import { screenTestProviders } from '../core/screen-testing';

const ORDER: OrderListItem = {
  id: 3,
  code: 'BY-1003',
  customer: { id: 1, name: 'Hollinford Otters Swim Club' },
  dueAt: '2020-01-02T15:00:00Z',
  status: 'open',
  pieces: 48,
  bagCount: 2,
  piecesByStage: { queued: 24, cut: 0, weeded: 0, pressed: 12, packed: 12 },
  createdAt: '2019-12-20T09:00:00Z',
};

function page(items: OrderListItem[], total = items.length): OrderPage {
  return { items, total, page: 1, pageSize: 20 };
}

describe('OrdersPage', () => {
  let fixture: ComponentFixture<OrdersPage>;
  let http: HttpTestingController;

  const element = () => fixture.nativeElement as HTMLElement;

  async function settle(ms = 0): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve, ms));
    await fixture.whenStable();
  }

  function expectList(): TestRequest {
    return http.expectOne((request) => request.method === 'GET' && request.url === '/api/orders');
  }

  beforeEach(async () => {
    TestBed.configureTestingModule({
      imports: [OrdersPage],
      providers: [
        ...screenTestProviders(),
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(OrdersPage);
    await settle();
  });

  afterEach(() => http.verify());

  it('asks the hub for open orders soonest due first, page 1 of 20', async () => {
    const request = expectList();
    expect(request.request.params.toString()).toBe('sort=dueAt&dir=asc&page=1&pageSize=20&status=open');
    request.flush(page([ORDER]));
    await settle();

    const row = element().querySelector('[data-testid=order-row]');
    expect(row?.textContent).toContain('BY-1003');
    expect(row?.textContent).toContain('Hollinford Otters Swim Club');
    expect(row?.querySelector('[data-testid=flag-overdue]')?.textContent).toBe('Overdue');
    expect(row?.textContent).toContain('12 / 48 packed');
  });

  it('sorts on the hub when a column header is tapped', async () => {
    expectList().flush(page([ORDER]));
    await settle();

    const header = Array.from(element().querySelectorAll<HTMLElement>('th')).find((th) => th.textContent?.includes('Customer'))!;
    header.querySelector<HTMLElement>('.mat-sort-header-container')!.click();
    await settle();

    const request = expectList();
    expect(request.request.params.get('sort')).toBe('customer');
    expect(request.request.params.get('dir')).toBe('asc');
    expect(request.request.params.get('page')).toBe('1');
    request.flush(page([ORDER]));
  });

  it('asks for the next page when the paginator moves on', async () => {
    expectList().flush(page([ORDER], 45));
    await settle();

    element().querySelector<HTMLButtonElement>('.mat-mdc-paginator-navigation-next')!.click();
    await settle();

    const request = expectList();
    expect(request.request.params.get('page')).toBe('2');
    expect(request.request.params.get('pageSize')).toBe('20');
    request.flush(page([], 45));
  });

  it('searches once the lead stops typing, from page 1', async () => {
    expectList().flush(page([ORDER]));
    await settle();

    const search = element().querySelector<HTMLInputElement>('input[type=search]')!;
    for (const text of ['O', 'Ot', 'Otters']) {
      search.value = text;
      search.dispatchEvent(new Event('input'));
    }
    await settle(10);
    http.expectNone((request) => request.url === '/api/orders');
    await settle(350);

    const request = expectList();
    expect(request.request.params.get('q')).toBe('Otters');
    expect(request.request.params.get('page')).toBe('1');
    request.flush(page([ORDER]));
  });

  it('says in a sentence when the hub cannot be reached', async () => {
    expectList().flush(null, { status: 0, statusText: 'Unknown Error' });
    await settle();

    expect(element().querySelector('[role=alert]')?.textContent).toContain('The hub cannot be reached.');
  });
});
