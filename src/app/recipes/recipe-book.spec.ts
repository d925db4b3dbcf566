import { importProvidersFrom, provideZonelessChangeDetection } from '@angular/core';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import type { RecipeListItem } from '../../shared/press/press-contract';
import { BROWSER_STORAGE } from '../core/browser-storage';
import { MemoryStorage } from '../core/memory-storage';
import { RecipeBook } from './recipe-book';

const RECIPE: RecipeListItem = {
  id: 7,
  filmTypeId: 1,
  filmTypeName: 'Standard PU 90 µm',
  fabricId: 3,
  fabricName: '50/50 cotton-poly',
  tempC: 150,
  tempF: 302,
  dwellS: 12,
  pressureClass: 'medium',
  peel: 'warm',
  prePressS: 3,
  tackS: 3,
  secondPressS: null,
  notes: '',
  source: 'Typical supplier sheet, from memory',
  updatedAt: '2026-11-30T10:00:00Z',
};

describe('RecipeBook', () => {
  let fixture: ComponentFixture<RecipeBook>;
  let http: HttpTestingController;
  let storage: MemoryStorage;

  async function open(units: 'imperial' | 'metric' | null): Promise<HTMLElement> {
    storage = new MemoryStorage();
    if (units) storage.setItem('dwell.recipes.units', units);
    TestBed.configureTestingModule({
      imports: [RecipeBook],
      providers: [
        provideZonelessChangeDetection(),
        provideHttpClient(),
        provideHttpClientTesting(),
        importProvidersFrom(MatIconTestingModule),
        { provide: BROWSER_STORAGE, useValue: storage },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(RecipeBook);
    http.expectOne('/api/recipes').flush([RECIPE, { ...RECIPE, id: 8, filmTypeName: 'Stretch PU 75 µm', fabricName: '100% polyester performance' }]);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  async function openEditor(root: HTMLElement): Promise<void> {
    root.querySelector<HTMLButtonElement>('button[aria-label="Edit Standard PU 90 µm on 50/50 cotton-poly"]')!.click();
    http.expectOne('/api/recipes/7/revisions').flush([]);
    await fixture.whenStable();
  }

  async function type(root: HTMLElement, testId: string, value: string): Promise<void> {
    const input = root.querySelector<HTMLInputElement>(`[data-testid=${testId}]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
  }

  async function save(root: HTMLElement): Promise<void> {
    root.querySelector<HTMLButtonElement>('[data-testid=recipe-save]')!.click();
    await fixture.whenStable();
  }

  afterEach(() => http.verify());

  it('shows temperatures in °F with °C beside them for a shop that works in °F', async () => {
    const root = await open('imperial');

    const cell = root.querySelector('td.temp')?.textContent ?? '';
    expect(cell).toContain('302 °F'); // 150 °C × 1.8 + 32 = 302 °F (NIST SP 811, appendix B.8)
    expect(cell).toContain('150 °C');
  });

  it('starts in the shop\'s own units on a tablet where nobody has chosen any yet', async () => {
    const root = await open(null);
    http.expectOne('/api/shop').flush({ units: 'metric' });
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();

    // The shop's unit reads first, in bold; the other beside it.
    expect(root.querySelector('td.temp strong')?.textContent?.trim()).toBe('150 °C');
    expect(root.querySelector('td.temp .other')?.textContent).toContain('302');
  });

  it('narrows the table to the recipes the filter words match', async () => {
    const root = await open('imperial');

    await type(root, 'recipe-filter', 'stretch');

    expect(root.querySelectorAll('tr.mat-mdc-row').length).toBe(1);
    expect(root.querySelector('tr.mat-mdc-row')?.textContent).toContain('Stretch PU 75 µm');
  });

  it('refuses 250 °C with a sentence next to the temperature and sends nothing', async () => {
    const root = await open('metric');
    await openEditor(root);

    await type(root, 'recipe-temperature', '250');
    await save(root);

    expect(root.querySelector('[data-testid=problem-temperature]')?.textContent).toContain('from 80 to 230 °C');
    http.expectNone('/api/recipes/7');
  });

  it('sends the temperature to the hub in °C when the shop types °F', async () => {
    const root = await open('imperial');
    await openEditor(root);

    await type(root, 'recipe-temperature', '320');
    await save(root);

    const put = http.expectOne({ method: 'PUT', url: '/api/recipes/7' });
    expect(put.request.body.tempC).toBe(160); // (320 °F − 32) / 1.8 = 160 °C (NIST SP 811, appendix B.8)
    put.flush({ ...RECIPE, tempC: 160, tempF: 320 });
    await fixture.whenStable();
    http.expectOne('/api/recipes/7/revisions').flush([]);
    await fixture.whenStable();
  });

  it('puts the hub\'s refusal of a field next to that field', async () => {
    const root = await open('metric');
    await openEditor(root);

    await save(root);
    http.expectOne({ method: 'PUT', url: '/api/recipes/7' }).flush(
      { error: 'Some of the recipe is missing or not valid.', details: [{ path: 'dwellS', message: 'dwellS is at most 120 s.' }] },
      { status: 400, statusText: 'Bad Request' },
    );
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();

    expect(root.querySelector('[data-testid=recipe-editor]')?.textContent).toContain('dwellS is at most 120 s.');
    expect(root.querySelector('[data-testid=recipe-save-problem]')?.textContent).toContain('missing or not valid');
  });
});
