import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import { Router } from '@angular/router';
import type { FabricOption, FilmOption } from '../../shared/intake-contract';
import { JobForm } from './job-form';
import { READ_FILE_TEXT } from './file-text';
import { screenTestProviders } from '../core/screen-testing';

const FILMS: FilmOption[] = [
  { id: 2, filmTypeId: 1, filmTypeName: 'Smooth PU', colour: 'Navy', colourHex: '#1b2a4a', wearClass: 1 },
  { id: 5, filmTypeId: 3, filmTypeName: 'Glitter', colour: 'Gold', colourHex: '#c9a227', wearClass: 4 },
];
const FABRICS: FabricOption[] = [{ id: 1, name: 'Cotton', maxTempC: 200 }];

// Names short enough for 2 in letters across a 12 in back (8 characters by the shared estimate).
const ROSTER = ['name,number,size', 'Ada,7,M', 'Bo Fenn,12,xxl', 'Cy Marsh,101,Q'].join('\n');

describe('JobForm', () => {
  let fixture: ComponentFixture<JobForm>;
  let http: HttpTestingController;
  let rosterText: string;

  const element = () => fixture.nativeElement as HTMLElement;
  const byTestId = <T extends HTMLElement = HTMLElement>(id: string) => element().querySelector<T>(`[data-testid="${id}"]`);

  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  }

  async function type(input: HTMLInputElement, text: string, event = 'input'): Promise<void> {
    input.value = text;
    input.dispatchEvent(new Event(event));
    await settle();
  }

  async function choose(trigger: HTMLElement, optionText: string): Promise<void> {
    trigger.querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
    await settle();
    // The newest panel is the open one; a closing panel may linger in the overlay.
    const option = Array.from(document.querySelectorAll<HTMLElement>('mat-option')).reverse().find((o) => o.textContent?.includes(optionText))!;
    option.click();
    await settle();
  }

  async function fillCommonFields(): Promise<void> {
    await type(byTestId<HTMLInputElement>('job-name')!, 'Club crest');
    await type(byTestId<HTMLInputElement>('design-width')!, '4');
    await type(byTestId<HTMLInputElement>('design-height')!, '3');
    await type(byTestId<HTMLInputElement>('garment')!, 'Cotton tee');
    await choose(byTestId('fabric')!, 'Cotton');
    await choose(byTestId('layer-film-1')!, 'Navy');
  }

  function saveButton(): HTMLButtonElement {
    return byTestId<HTMLButtonElement>('save-job')!;
  }

  beforeEach(async () => {
    rosterText = ROSTER;
    TestBed.configureTestingModule({
      imports: [JobForm],
      providers: [
        ...screenTestProviders(),
        { provide: READ_FILE_TEXT, useValue: () => Promise.resolve(rosterText) },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    jest.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    fixture = TestBed.createComponent(JobForm);
    fixture.componentRef.setInput('id', '7');
    await settle();
    http.expectOne('/api/films').flush(FILMS);
    http.expectOne('/api/fabrics').flush(FABRICS);
    await settle();
  });

  afterEach(() => http.verify());

  it('adds up the pieces typed for each size as they are typed', async () => {
    await type(byTestId<HTMLInputElement>('qty-YL')!, '2');
    await type(byTestId<HTMLInputElement>('qty-S')!, '4');
    await type(byTestId<HTMLInputElement>('qty-M')!, '10');

    expect(byTestId('pieces-total')?.textContent?.trim()).toBe('Total: 16 pieces');
  });

  it('sends the job with its layers in pressing order after a reorder, sizes in mm', async () => {
    await fillCommonFields();
    byTestId('add-layer')!.click();
    await settle();
    await choose(byTestId('layer-film-2')!, 'Gold');
    element().querySelector<HTMLButtonElement>('[aria-label="Move layer 2 earlier"]')!.click();
    await settle();
    await type(byTestId<HTMLInputElement>('qty-M')!, '10');
    await type(byTestId<HTMLInputElement>('qty-L')!, '14');

    saveButton().click();
    await settle();

    expect(Array.from(element().querySelectorAll('.dw-sentence-error'), (e) => e.textContent)).toEqual([]);
    const request = http.expectOne({ method: 'POST', url: '/api/orders/7/jobs' });
    // 1 in = 25.4 mm exactly (NIST SP 811, B.8): 4 in = 101.6 mm and 3 in = 76.2 mm, sent as whole mm.
    expect(request.request.body).toEqual({
      name: 'Club crest',
      designWidthMm: 102,
      designHeightMm: 76,
      placement: 'full_front',
      garment: 'Cotton tee',
      fabricId: 1,
      layers: [5, 2],
      quantities: { M: 10, L: 14 },
    });
    request.flush({ id: 30 });
    await settle();
  });

  it('keeps the design fields when an upload is refused and says why', async () => {
    await type(byTestId<HTMLInputElement>('job-name')!, 'Club crest');
    const input = byTestId<HTMLInputElement>('design-file')!;
    Object.defineProperty(input, 'files', { value: [new File(['<svg/>'], 'crest.svg', { type: 'image/svg+xml' })] });
    input.dispatchEvent(new Event('change'));
    await settle();
    http.expectOne({ method: 'POST', url: '/api/designs' }).flush(
      { error: 'The SVG has a script in it. Export it again without scripts.' },
      { status: 415, statusText: 'Unsupported Media Type' },
    );
    await settle();

    expect(byTestId('error-design')?.textContent?.trim()).toBe('The SVG has a script in it. Export it again without scripts.');
    expect(byTestId<HTMLInputElement>('job-name')!.value).toBe('Club crest');
  });

  describe('with a roster', () => {
    async function importRoster(): Promise<void> {
      byTestId('mode-roster')!.querySelector('button')!.click();
      await settle();
      const input = byTestId<HTMLInputElement>('roster-file')!;
      Object.defineProperty(input, 'files', { value: [new File([rosterText], 'otters.csv', { type: 'text/csv' })] });
      input.dispatchEvent(new Event('change'));
      await settle();
    }

    it('lists the bad row with its sentences and counts ready and bad rows', async () => {
      await importRoster();

      expect(byTestId('roster-summary')?.textContent?.replace(/\s+/g, ' ').trim()).toBe('2 rows ready, 1 needs fixing');
      const errors = element().querySelectorAll('[data-testid=roster-row-errors]');
      expect(errors).toHaveLength(1);
      expect(errors[0].textContent).toContain('"101" is not a jersey number');
      expect(errors[0].textContent).toContain('"Q" is not a size Dwell knows');
    });

    it('re-checks an edited row and enables Save only once every row is good', async () => {
      await fillCommonFields();
      await importRoster();
      expect(saveButton().disabled).toBe(true);

      const badRow = element().querySelector('[data-testid=roster-row][data-line="4"]')!;
      await type(badRow.querySelector<HTMLInputElement>('[data-testid=edit-number]')!, '10', 'change');
      expect(element().querySelector('[data-testid=roster-row-errors]')?.textContent).not.toContain('jersey number');
      expect(saveButton().disabled).toBe(true);

      await type(badRow.querySelector<HTMLInputElement>('[data-testid=edit-size]')!, 'L', 'change');
      expect(element().querySelectorAll('[data-testid=roster-row-errors]')).toHaveLength(0);
      expect(byTestId('roster-summary')?.textContent?.replace(/\s+/g, ' ').trim()).toBe('3 rows ready, 0 need fixing');
      expect(saveButton().disabled).toBe(false);
      http.expectNone('/api/orders/7/jobs');

      saveButton().click();
      await settle();
      const request = http.expectOne({ method: 'POST', url: '/api/orders/7/jobs' });
      expect(request.request.body.rosterLines).toEqual([
        { name: 'Ada', number: '7', size: 'M', extraText: '' },
        { name: 'Bo Fenn', number: '12', size: '2XL', extraText: '' },
        { name: 'Cy Marsh', number: '10', size: 'L', extraText: '' },
      ]);
      expect(request.request.body.quantities).toBeUndefined();
      request.flush({ id: 31 });
      await settle();
    });
  });
});
