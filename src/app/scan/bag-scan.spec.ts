import 'fake-indexeddb/auto';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { importProvidersFrom, provideZonelessChangeDetection } from '@angular/core';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import type { StationTicket } from '../../shared/events-contract';
import { plainTicket } from '../sync/station-testing';
import { TicketCache } from '../sync/ticket-cache';
import { BagScan } from './bag-scan';

const TOKEN = 'Ab3_dE-fGh1jKlMnOpQrStUvWxYz0123456789abcde';

describe('BagScan', () => {
  let fixture: ComponentFixture<BagScan>;
  let emitted: (StationTicket | string)[];
  const ticket = plainTicket(3, { M: 4 });
  const cache = { findByCode: jest.fn(), findByToken: jest.fn() };

  beforeEach(async () => {
    cache.findByCode.mockReset().mockImplementation(async (code: string) => (code === '2001-C' ? ticket : null));
    cache.findByToken.mockReset().mockImplementation(async (token: string) => (token === TOKEN ? ticket : null));
    TestBed.configureTestingModule({
      imports: [BagScan],
      providers: [provideZonelessChangeDetection(), importProvidersFrom(MatIconTestingModule), { provide: TicketCache, useValue: cache }],
    });
    fixture = TestBed.createComponent(BagScan);
    emitted = [];
    fixture.componentInstance.scanned.subscribe((value) => emitted.push(value));
    await fixture.whenStable();
  });

  const text = () => (fixture.nativeElement as HTMLElement).textContent ?? '';
  const problem = () => (fixture.nativeElement as HTMLElement).querySelector('[data-testid="scan-problem"]')?.textContent?.trim() ?? '';

  it('finds a bag by its typed code and emits the ticket', async () => {
    const input = (fixture.nativeElement as HTMLElement).querySelector<HTMLInputElement>('[data-testid="bag-code-input"]')!;
    input.value = ' 2001 - c ';
    input.dispatchEvent(new Event('input'));
    (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('[data-testid="find-bag"]')!.click();
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();

    expect(cache.findByCode).toHaveBeenCalledWith('2001-C');
    expect(emitted).toEqual([ticket]);
    expect(problem()).toBe('');
  });

  it('finds a bag from a label address of this hub', async () => {
    await fixture.componentInstance.find(`${location.origin}/bag/${TOKEN}`);
    expect(cache.findByToken).toHaveBeenCalledWith(TOKEN);
    expect(emitted).toEqual([ticket]);
  });

  it('refuses a label address of another hub with a sentence and looks nothing up', async () => {
    await fixture.componentInstance.find(`https://other-shop.example/bag/${TOKEN}`);
    await fixture.whenStable();

    expect(cache.findByToken).not.toHaveBeenCalled();
    expect(problem()).toContain('other-shop.example');
    expect(typeof emitted[0]).toBe('string');
  });

  it('says what a bag code looks like when the text is not one', async () => {
    await fixture.componentInstance.find('banana');
    await fixture.whenStable();
    expect(problem()).toContain('A bag code looks like 1043-B');
  });

  it('says the bag is not open here when the code is unknown', async () => {
    await fixture.componentInstance.find('9999-Z');
    await fixture.whenStable();
    expect(problem()).toContain('No open bag 9999-Z');
    expect(text()).toContain('No open bag');
  });

  it('takes a fast keystroke burst ending in Enter, outside the field, as a scan', async () => {
    // jsdom stamps each event with the real time: these keys go out within a few milliseconds, as a scanner's do.
    for (const key of [...'2001-C', 'Enter']) document.dispatchEvent(new KeyboardEvent('keydown', { key }));
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
    expect(cache.findByCode).toHaveBeenCalledWith('2001-C');
    expect(emitted).toEqual([ticket]);
  });
});
