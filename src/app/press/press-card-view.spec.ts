import { importProvidersFrom, provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { PRESS_CAUTIONS } from '../../shared/press/cautions';
import type { PressCard as PressCardData } from '../../shared/press/press-contract';
import { PressCardView } from './press-card-view';

/** A two-layer card on the air press, as the hub sends it. */
function twoLayerCard(overrides: Partial<PressCardData> = {}): PressCardData {
  return {
    steps: [
      { filmId: 11, seconds: 3, kind: 'tack' },
      { filmId: 12, seconds: 15, kind: 'dwell' },
    ],
    temperatureC: 150,
    temperatureF: 302,
    dwellS: 15,
    prePressS: 5,
    secondPressS: null,
    pressureClass: 'medium',
    peel: 'warm',
    gauge: { gaugePsi: 40, gaugeKPa: 275.8, platenPsi: 1.41, forceLbf: 452, forceN: 2011 },
    totalHeatS: 23,
    heatExposureLimitS: 45,
    capped: false,
    warnings: [],
    cautions: [...PRESS_CAUTIONS],
    sources: ['Typical supplier sheet, from memory'],
    layers: [
      { position: 1, filmId: 11, filmTypeId: 1, filmTypeName: 'Standard PU 90 µm', colour: 'White', recipeId: 1, recipeTempC: 150, pressureClass: 'medium', peel: 'warm', notes: '' },
      { position: 2, filmId: 12, filmTypeId: 1, filmTypeName: 'Standard PU 90 µm', colour: 'Red', recipeId: 1, recipeTempC: 150, pressureClass: 'medium', peel: 'warm', notes: '' },
    ],
    suggestions: [],
    fabric: { id: 3, name: '50/50 cotton-poly', maxTempC: 170 },
    press: { id: 2, name: 'Air press 16 x 20', kind: 'air', note: '' },
    units: 'imperial',
    display: {
      temperature: { primary: '302 °F', secondary: '150 °C' },
      gauge: { primary: '40 psi', secondary: '276 kPa' },
    },
    ...overrides,
  };
}

async function render(card: PressCardData): Promise<HTMLElement> {
  TestBed.configureTestingModule({
    imports: [PressCardView],
    providers: [provideZonelessChangeDetection(), importProvidersFrom(MatIconTestingModule)],
  });
  const fixture = TestBed.createComponent(PressCardView);
  fixture.componentRef.setInput('card', card);
  fixture.componentRef.setInput('jobLayers', [
    { position: 1, filmId: 11, filmName: 'Standard PU 90 µm', colour: 'White', colourHex: '#FFFFFF' },
    { position: 2, filmId: 12, filmName: 'Standard PU 90 µm', colour: 'Red', colourHex: '#C8102E' },
  ]);
  await fixture.whenStable();
  return fixture.nativeElement as HTMLElement;
}

const text = (root: HTMLElement, testId: string) => root.querySelector(`[data-testid=${testId}]`)?.textContent?.replace(/\s+/g, ' ').trim() ?? null;

describe('PressCardView', () => {
  it('shows the temperature in the shop\'s units large and the other unit beside it', async () => {
    const root = await render(twoLayerCard());

    expect(root.querySelector('[data-testid=press-temperature] .big')?.getAttribute('aria-label')).toBe('302 °F');
    expect(root.querySelector('[data-testid=press-temperature] .big')?.textContent?.replace(/\s+/g, '')).toBe('302°F');
    expect(text(root, 'press-temperature')).toContain('150 °C');
    expect(text(root, 'press-dwell')).toContain('15 s');
  });

  it('shows every safety caution even when the card has no warnings', async () => {
    const root = await render(twoLayerCard());

    const cautions = text(root, 'press-cautions') ?? '';
    for (const caution of PRESS_CAUTIONS) expect(cautions).toContain(caution.slice(caution.indexOf(':') + 1).trim());
    expect(root.querySelector('[data-testid=press-warnings]')).toBeNull();
  });

  it('puts the warnings in a band when the card has any, with a low-temperature suggestion in the shop\'s units', async () => {
    const root = await render(
      twoLayerCard({
        capped: true,
        warnings: ['Nylon takes at most 135 °C: the card is capped at 135 °C.'],
        suggestions: [{ forFilmTypeId: 1, filmTypeId: 4, filmTypeName: 'Low-temp PU 80 µm', recipeId: 9, tempC: 130, tempF: 266 }],
      }),
    );

    const band = text(root, 'press-warnings') ?? '';
    expect(band).toContain('capped at 135 °C');
    expect(band).toContain('Low-temp PU 80 µm at 266 °F'); // 130 °C × 1.8 + 32 = 266 °F (NIST SP 811, appendix B.8)
    expect(text(root, 'press-cautions')).toContain('Hot platen');
  });

  it('shows the gauge setting for an air press', async () => {
    const root = await render(twoLayerCard());

    expect(text(root, 'press-gauge')).toBe('Gauge 40 psi');
  });

  it('shows no gauge for a manual press, only the pressure class', async () => {
    const root = await render(
      twoLayerCard({ gauge: undefined, press: { id: 1, name: 'Clamshell 15 x 15', kind: 'manual', note: '' }, display: { temperature: { primary: '302 °F', secondary: '150 °C' } } }),
    );

    expect(root.querySelector('[data-testid=press-gauge]')).toBeNull();
    expect(text(root, 'press-pressure')).toContain('Medium');
  });

  it('numbers the layers bottom first with a tack for the under-layer and the dwell on the top one', async () => {
    const root = await render(twoLayerCard({ secondPressS: 5 }));

    const steps = Array.from(root.querySelectorAll('[data-testid=press-layers] li'), (li) =>
      Array.from(li.querySelectorAll('span'), (span) => span.textContent?.trim()).filter(Boolean).join(' '),
    );
    expect(steps).toEqual(['1 White Standard PU 90 µm Tack 3 s', '2 Red Standard PU 90 µm Dwell 15 s', '3 Peel, then second press 5 s']);
  });

  it('names the peel in words with an icon of its own, so it does not rely on colour', async () => {
    const cold = await render(twoLayerCard({ peel: 'cold' }));
    const coldIcon = cold.querySelector('[data-testid=press-peel] mat-icon')?.getAttribute('data-mat-icon-name');
    TestBed.resetTestingModule();
    const hot = await render(twoLayerCard({ peel: 'hot' }));
    const hotIcon = hot.querySelector('[data-testid=press-peel] mat-icon')?.getAttribute('data-mat-icon-name');

    expect(text(cold, 'press-peel')).toContain('Cold peel');
    expect(text(hot, 'press-peel')).toContain('Hot peel');
    expect(coldIcon).toBe('peel-cold');
    expect(hotIcon).toBe('peel-hot');
  });
});
