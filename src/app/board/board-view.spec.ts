import { ComponentFixture, TestBed } from '@angular/core/testing';
import { importProvidersFrom, provideZonelessChangeDetection } from '@angular/core';
import { provideRouter } from '@angular/router';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { By } from '@angular/platform-browser';
import { BaseChartDirective } from 'ng2-charts';
import type { BoardReply } from '../../shared/board-contract';
import { BoardView, type BoardPart } from './board-view';
import { specBoard } from './board-testing';

describe('BoardView', () => {
  let fixture: ComponentFixture<BoardView>;

  beforeAll(() => {
    // jsdom draws no canvas; chart.js is then simply not started, and the text tables carry the numbers.
    jest.spyOn(HTMLCanvasElement.prototype, 'getContext').mockReturnValue(null);
  });

  async function render(board: BoardReply, mode: 'lead' | 'wall' = 'lead', part: BoardPart = 'all'): Promise<HTMLElement> {
    TestBed.configureTestingModule({
      imports: [BoardView],
      providers: [provideZonelessChangeDetection(), provideRouter([]), importProvidersFrom(MatIconTestingModule)],
    });
    fixture = TestBed.createComponent(BoardView);
    fixture.componentRef.setInput('board', board);
    fixture.componentRef.setInput('mode', mode);
    fixture.componentRef.setInput('part', part);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  const text = (root: ParentNode, selector: string) => root.querySelector(selector)?.textContent?.replace(/\s+/g, ' ').trim() ?? null;

  it('shows bags and pieces in each stage, in floor order', async () => {
    const page = await render(specBoard());

    const columns = Array.from(page.querySelectorAll('[data-testid=stage-column]'));
    expect(columns.map((column) => column.getAttribute('data-stage'))).toEqual(['queued', 'cut', 'weeded', 'pressed', 'packed']);
    const weeded = page.querySelector('[data-testid=stage-column][data-stage=weeded]')!;
    expect(text(weeded, '[data-testid=stage-pieces]')).toBe('58');
    expect(text(weeded, '[data-testid=stage-bags]')).toBe('3');
  });

  it('marks an order at risk with words and an icon, and an on-time order as on time', async () => {
    const page = await render(specBoard());

    const atRisk = page.querySelector('[data-testid=board-order][data-order-code=SPEC-1]')!;
    expect(text(atRisk, '[data-testid=order-status]')).toBe('At risk');
    expect(atRisk.querySelector('[data-testid=order-status] mat-icon')?.getAttribute('svgIcon')).toBe('warning');
    expect(text(atRisk, '[data-testid=order-due]')).toBe('Today 14:00');
    expect(text(atRisk, '[data-testid=order-eta]')).toBe('Today 16:10');
    const onTime = page.querySelector('[data-testid=board-order][data-order-code=SPEC-2]')!;
    expect(text(onTime, '[data-testid=order-status]')).toBe('On time');
    expect(text(onTime, '[data-testid=order-due]')).toBe('Tomorrow 12:00');
    expect(text(onTime, '[data-testid=order-eta]')).toContain('standard rate');
    expect(text(page, '[data-testid=orders-at-risk-count]')).toBe('1 at risk');
  });

  it('names the slowest stage of an order only when its rate was seen on the floor', async () => {
    const page = await render(specBoard());
    // SPEC-1 waits on presses seen at work this shift; SPEC-2's ETA rests on the shop's standard rate, where every stage is alike.
    expect(text(page.querySelector('[data-order-code=SPEC-1]')!, '[data-testid=order-left]')).toBe('88 slowest: Press');
    expect(text(page.querySelector('[data-order-code=SPEC-2]')!, '[data-testid=order-left]')).toBe('24');
  });

  it('says a station is offline in words, with its last event and last sync', async () => {
    const page = await render(specBoard());

    const press = page.querySelector('[data-testid=board-station][data-station-kind=press]')!;
    expect(text(press, '[data-testid=station-online]')).toBe('Offline');
    expect(text(press, '[data-testid=station-shift-pieces]')).toBe('153');
    expect(text(press, '[data-testid=station-last-event]')).toBe('Last event 09:58');
    expect(text(press, '[data-testid=station-last-sync]')).toBe('Last sync 09:59');
    const cutter = page.querySelector('[data-testid=board-station][data-station-kind=cut]')!;
    expect(text(cutter, '[data-testid=station-online]')).toBe('Online');
    expect(text(cutter, '[data-testid=station-rate]')).toBe('31');
  });

  it('finds a station by its name and says since when an offline station was last heard from', async () => {
    const page = await render(specBoard());

    const press = page.querySelector('[data-testid=board-station][data-station-name="Spec Press"]')!;
    expect(press.getAttribute('data-station-kind')).toBe('press');
    expect(text(press, '.state')).toBe('Offline since 10:02');
    expect(press.querySelector('[data-testid=station-online] mat-icon')?.getAttribute('svgIcon')).toBe('offline');
    const cutter = page.querySelector('[data-testid=board-station][data-station-name="Spec Cutter"]')!;
    expect(text(cutter, '.state')).toBe('Online');
  });

  it('lays the stations out as rows under one line of headings on a wall, and as cards for the lead', async () => {
    const lead = await render(specBoard());
    expect(lead.querySelector('dw-station-status')?.classList.contains('rows')).toBe(false);

    TestBed.resetTestingModule();
    const wall = await render(specBoard(), 'wall', 'now');
    const stations = wall.querySelector('dw-station-status')!;
    expect(stations.classList.contains('rows')).toBe(true);
    expect(Array.from(stations.querySelectorAll('.columns span'), (heading) => heading.textContent)).toEqual(['Per hour', 'This shift']);
    expect(stations.querySelector('.columns')?.getAttribute('aria-hidden')).toBe('true');
  });

  it('keeps a due date and an ETA whole, breaking only between the day and the time', async () => {
    const page = await render(specBoard());

    const onTime = page.querySelector('[data-testid=board-order][data-order-code=SPEC-2]')!;
    const parts = (cell: string) => Array.from(onTime.querySelectorAll(`[data-testid=${cell}] .part`), (part) => part.textContent);
    expect(parts('order-due')).toEqual(['Tomorrow', '12:00']);
    expect(parts('order-eta')).toEqual(['Today', '13:05']);
  });

  it('gives each chart a label and a table of its numbers', async () => {
    const page = await render(specBoard());

    const pressRow = page.querySelector('[data-testid=rates-row][data-station-name="Spec Press"]')!;
    expect(Array.from(pressRow.querySelectorAll('td'), (cell) => cell.textContent)).toEqual(['35', '41', '47', '30']);
    expect(page.querySelector('dw-station-rates-chart canvas')?.getAttribute('aria-label')).toBe(
      'Pieces per hour by station since 07:00. Hour from 10:00: Spec Cutter 19, Spec Press 30.',
    );
    const pareto = Array.from(page.querySelectorAll('[data-testid=pareto-row]'), (row) =>
      Array.from(row.children, (cell) => cell.textContent?.trim()).join(' | '),
    );
    expect(pareto).toEqual(['Lifted edge | 6 | 60 % | 60 %', 'Crooked placement | 3 | 30 % | 90 %', 'Scorch | 1 | 10 % | 100 %']);
  });

  it('feeds the charts one line per station and the Pareto bars with their running share, without animation', async () => {
    await render(specBoard());

    const [rates, pareto] = fixture.debugElement.queryAll(By.directive(BaseChartDirective)).map((el) => el.injector.get(BaseChartDirective));
    expect(rates!.data?.labels).toEqual(['07:00', '08:00', '09:00', '10:00']);
    expect(rates!.data?.datasets.map((set) => [set.label, set.data])).toEqual([
      ['Spec Cutter', [20, 28, 30, 19]],
      ['Spec Press', [35, 41, 47, 30]],
    ]);
    expect(rates!.options?.animation).toBe(false);
    expect(pareto!.data?.datasets.map((set) => [set.type, set.data])).toEqual([
      ['bar', [6, 3, 1]],
      ['line', [60, 90, 100]],
    ]);
    expect(pareto!.options?.animation).toBe(false);
  });

  it('shows first-pass yield, spoil rate and takt time as large numbers', async () => {
    const page = await render(specBoard());

    expect(text(page, '[data-testid=tile-first-pass-yield]')).toBe('96 %');
    expect(text(page, '[data-testid=tile-spoil-rate]')).toBe('2.4 %');
    expect(text(page, '[data-testid=tile-takt]')).toBe('1 min 32 s');
    expect(text(page, '[data-testid=tile-pieces-due]')).toBe('240');
  });

  it('lists film running low in the shop\'s lengths and the over-count flags', async () => {
    const page = await render(specBoard());

    // 90 in = 2.5 yd, since 1 yd = 36 in exactly (NIST SP 811, 2008, appendix B.8).
    expect(text(page, '[data-testid=low-roll-left]')).toBe('2.50 yd');
    expect(text(page, '[data-testid=board-flag]')).toContain('Over-count on bag SPEC-1-C');
    expect(text(page, '[data-testid=board-flag]')).toContain('Pressed 26 of 24 pieces.');
  });

  it('links orders and low rolls for the lead, and shows no links on a wall', async () => {
    const lead = await render(specBoard());
    expect(lead.querySelector('[data-testid=board-order][data-order-code=SPEC-1] a')?.getAttribute('href')).toBe('/orders/901');
    expect(lead.querySelector('dw-low-rolls a')?.getAttribute('href')).toBe('/roll-rack');

    TestBed.resetTestingModule();
    const wall = await render(specBoard(), 'wall');
    expect(wall.querySelectorAll('a')).toHaveLength(0);
    expect(wall.querySelectorAll('button')).toHaveLength(0);
  });

  it('shows only the floor now or only the shift so far when a wall turns between views', async () => {
    const now = await render(specBoard(), 'wall', 'now');
    expect(now.querySelector('dw-stage-columns')).not.toBeNull();
    expect(now.querySelector('dw-station-rates-chart')).toBeNull();

    TestBed.resetTestingModule();
    const trends = await render(specBoard(), 'wall', 'trends');
    expect(trends.querySelector('dw-stage-columns')).toBeNull();
    expect(trends.querySelector('dw-spoil-pareto-chart')).not.toBeNull();
  });

  it('counts the orders a wall display has no room for', async () => {
    const many = Array.from({ length: 11 }, (_, i) => ({ ...specBoard().orders[1]!, id: 1000 + i, code: `SPEC-M${i}` }));
    const wall = await render(specBoard({ orders: many }), 'wall', 'now');

    expect(wall.querySelectorAll('[data-testid=board-order]')).toHaveLength(6);
    expect(text(wall, '[data-testid=orders-more]')).toBe('and 5 more open orders');
  });
});
