import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideRouter } from '@angular/router';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import type { CutGroup, CutterView } from '../../shared/cutting/cut-plan-contract';
import { GangPlanner } from './gang-planner';

const CUTTER: CutterView = {
  id: 4, name: 'Cutter 24', carriageWidthMm: 610, minMediaMm: 305, maxMediaMm: 508, bladeInstalledAt: null,
  bladeDistanceMm: 0, lastTestCutAt: null, sinceTestMm: 0, testCutEveryMm: 500000, lastFilmTypeId: null,
};
const bag = (bagId: number, bagCode: string) => ({
  bagId, bagCode, orderCode: '1043', jobName: 'Front', pieces: 24, designWidthMm: 254, designHeightMm: 229, rotationAllowed: true, layerNote: null,
});
const GROUPS: CutGroup[] = [
  { filmId: 7, filmTypeId: 1, filmTypeName: 'Standard PU 90 µm', colour: 'White', colourHex: '#FFFFFF', pieces: 48, bags: [bag(11, '1043-D'), bag(12, '1043-E')] },
  { filmId: 9, filmTypeId: 1, filmTypeName: 'Standard PU 90 µm', colour: 'Red', colourHex: '#C8102E', pieces: 24, bags: [bag(13, '1044-A')] },
];

describe('GangPlanner', () => {
  let fixture: ComponentFixture<GangPlanner>;
  let http: HttpTestingController;
  const element = () => fixture.nativeElement as HTMLElement;
  const settle = async () => {
    await new Promise((resolve) => setTimeout(resolve, 0));
    await fixture.whenStable();
  };

  beforeEach(async () => {
    TestBed.configureTestingModule({
      imports: [GangPlanner, MatIconTestingModule],
      providers: [provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(GangPlanner);
    http.expectOne('/api/cut-groups').flush(GROUPS);
    http.expectOne('/api/cutters').flush([CUTTER]);
    await settle();
  });

  afterEach(() => http.verify());

  it('shows one big tile per film with its colour, bags and pieces', () => {
    const tiles = [...element().querySelectorAll('.group-tile')].map((t) => [...t.querySelectorAll('span')].map((s) => s.textContent!.trim()).filter(Boolean).join(' | '));
    expect(tiles).toEqual(['White | Standard PU 90 µm | 2 bags · 48 pieces', 'Red | Standard PU 90 µm | 1 bag · 24 pieces']);
  });

  it('picks every bag of a chosen group and asks for their layout on that film', async () => {
    element().querySelector<HTMLButtonElement>('[data-testid="group-7"]')!.click();
    await settle();
    const preview = http.expectOne('/api/cut-plans/preview');
    expect(preview.request.body).toEqual({ bagIds: [11, 12], filmId: 7, cutterId: 4 });
    preview.flush({ error: 'x' }, { status: 400, statusText: 'Bad Request' });
    await settle();
    const checked = [...element().querySelectorAll('.bag-tile')].map((t) => t.getAttribute('aria-checked'));
    expect(checked).toEqual(['true', 'true']);
  });

  it('takes a bag out of the gang when its tile is tapped, and lays out only the rest', async () => {
    element().querySelector<HTMLButtonElement>('[data-testid="group-7"]')!.click();
    await settle();
    http.expectOne('/api/cut-plans/preview').flush({ error: 'x' }, { status: 400, statusText: 'Bad Request' });
    await settle();
    element().querySelector<HTMLButtonElement>('[data-testid="bag-1043-D"]')!.click();
    await settle();
    const preview = http.expectOne('/api/cut-plans/preview');
    expect(preview.request.body.bagIds).toEqual([12]);
    preview.flush({ error: 'The piece is too wide.' }, { status: 400, statusText: 'Bad Request' });
    await settle();
    expect(element().querySelector('[data-testid="bag-1043-D"]')!.getAttribute('aria-checked')).toBe('false');
    expect(element().querySelector('[data-testid="plan-problem"]')!.textContent).toContain('The piece is too wide.');
  });

  it('asks for nothing once no bag is picked', async () => {
    element().querySelector<HTMLButtonElement>('[data-testid="group-9"]')!.click();
    await settle();
    http.expectOne('/api/cut-plans/preview').flush({ error: 'x' }, { status: 400, statusText: 'Bad Request' });
    await settle();
    element().querySelector<HTMLButtonElement>('[data-testid="bag-1044-A"]')!.click();
    await settle();
    http.expectNone('/api/cut-plans/preview');
    expect(element().querySelector('dw-plan-summary')).toBeNull();
  });
});
