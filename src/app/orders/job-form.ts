import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, signal } from '@angular/core';
import { HttpErrorResponse } from '@angular/common/http';
import { Router, RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import {
  PLACEMENTS,
  SIZES,
  type DesignUpload,
  type FabricOption,
  type FilmOption,
  type JobCreate,
  type Placement,
  type Size,
  type SizeQuantities,
} from '../../shared/intake-contract';
import { countPieces } from '../../shared/intake/bag-split';
import { RosterPreview, toRosterLineInputs } from '../../shared/intake/roster-csv';
import { apiErrorSentence } from '../core/api-error';
import { OrdersApi } from './orders-api';
import {
  PLACEMENT_LABELS,
  PLACEMENT_MAX_WIDTH_MM,
  fahrenheitFromCelsius,
  inchesFromMm,
  mmFromInches,
} from './order-display';
import { RosterImport } from './roster-import';

/** The fields of the job form that can carry a sentence of their own. */
type Field = 'name' | 'design' | 'size' | 'placement' | 'offsets' | 'layers' | 'garment' | 'fabric' | 'quantities' | 'roster';

// The hub's `details[].path` (first segment) as a field of this form.
const SERVER_PATHS: Readonly<Record<string, Field>> = {
  name: 'name',
  designFile: 'design',
  designWidthMm: 'size',
  designHeightMm: 'size',
  placement: 'placement',
  offsetXMm: 'offsets',
  offsetYMm: 'offsets',
  garment: 'garment',
  fabricId: 'fabric',
  layers: 'layers',
  quantities: 'quantities',
  rosterLines: 'roster',
};

const MAX_LAYERS = 4;
const YOUTH_SIZES = SIZES.filter((size) => size.startsWith('Y'));
const ADULT_SIZES = SIZES.filter((size) => !size.startsWith('Y'));
const ACCEPTED_TYPES = ['image/svg+xml', 'image/png'];

/** A layer row on the form: a film picked (or not yet), with a key that survives reordering. */
interface LayerRow {
  key: number;
  filmId: number | null;
}

/** Add a job to an order: design, size, placement, film layers, garment, fabric, and pieces by size or from a roster. */
@Component({
  selector: 'dw-job-form',
  imports: [
    RouterLink,
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    RosterImport,
  ],
  templateUrl: './job-form.html',
  styleUrl: './job-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class JobForm implements OnInit {
  private readonly api = inject(OrdersApi);
  private readonly router = inject(Router);

  /** The order's id from the route. */
  readonly id = input.required<string>();

  protected readonly placements = PLACEMENTS;
  protected readonly placementLabels = PLACEMENT_LABELS;
  protected readonly youthSizes = YOUTH_SIZES;
  protected readonly adultSizes = ADULT_SIZES;
  protected readonly maxLayers = MAX_LAYERS;
  protected readonly fahrenheit = fahrenheitFromCelsius;

  protected readonly films = signal<FilmOption[]>([]);
  protected readonly fabrics = signal<FabricOption[]>([]);

  protected readonly name = signal('');
  protected readonly design = signal<DesignUpload | null>(null);
  protected readonly uploading = signal(false);
  protected readonly widthIn = signal<number | null>(null);
  protected readonly heightIn = signal<number | null>(null);
  protected readonly placement = signal<Placement>('full_front');
  protected readonly offsetXIn = signal<number | null>(null);
  protected readonly offsetYIn = signal<number | null>(null);
  protected readonly layers = signal<LayerRow[]>([{ key: 1, filmId: null }]);
  protected readonly garment = signal('');
  protected readonly fabricId = signal<number | null>(null);
  protected readonly mode = signal<'sizes' | 'roster'>('sizes');
  protected readonly quantities = signal<SizeQuantities>({});
  protected readonly roster = signal<RosterPreview | null>(null);

  protected readonly errors = signal<Partial<Record<Field, string>>>({});
  protected readonly problem = signal<string | null>(null);
  protected readonly saving = signal(false);

  protected readonly total = computed(() => countPieces(this.quantities()));
  protected readonly widthMm = computed(() => mmOrNull(this.widthIn()));
  protected readonly heightMm = computed(() => mmOrNull(this.heightIn()));
  protected readonly rosterWidthMm = computed(() => {
    const placement = this.placement();
    return placement === 'custom' ? (this.widthMm() ?? PLACEMENT_MAX_WIDTH_MM.full_back) : PLACEMENT_MAX_WIDTH_MM[placement];
  });
  protected readonly filmsById = computed(() => new Map(this.films().map((film) => [film.id, film])));
  protected readonly chosenFabric = computed(() => this.fabrics().find((fabric) => fabric.id === this.fabricId()) ?? null);
  protected readonly canSave = computed(() => {
    if (this.saving() || this.uploading()) return false;
    if (this.mode() === 'roster') {
      const roster = this.roster();
      return roster !== null && roster.rows.length > 0 && roster.errorCount === 0;
    }
    return true;
  });
  protected readonly saveLabel = computed(() => {
    if (this.saving()) return 'Saving…';
    const roster = this.roster();
    return this.mode() === 'roster' && roster ? `Save job with ${roster.rows.length} roster lines` : 'Save job';
  });
  private nextLayerKey = 2;

  async ngOnInit(): Promise<void> {
    try {
      const [films, fabrics] = await Promise.all([firstValueFrom(this.api.films()), firstValueFrom(this.api.fabrics())]);
      this.films.set(films);
      this.fabrics.set(fabrics);
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The films and fabrics could not be loaded. Reload to try again.'));
    }
  }

  protected textTyped(field: 'name' | 'garment', text: string): void {
    (field === 'name' ? this.name : this.garment).set(text);
    this.clearError(field);
  }

  protected numberTyped(target: 'width' | 'height' | 'offsetX' | 'offsetY', text: string): void {
    const value = text.trim() === '' ? null : Number(text);
    const signals = { width: this.widthIn, height: this.heightIn, offsetX: this.offsetXIn, offsetY: this.offsetYIn };
    signals[target].set(value);
    this.clearError(target === 'width' || target === 'height' ? 'size' : 'offsets');
  }

  protected async designChosen(input: HTMLInputElement): Promise<void> {
    const file = input.files?.[0];
    input.value = '';
    if (file) await this.upload(file);
  }

  protected async designDropped(event: DragEvent): Promise<void> {
    event.preventDefault();
    const file = event.dataTransfer?.files?.[0];
    if (file) await this.upload(file);
  }

  protected placementChosen(placement: Placement): void {
    this.placement.set(placement);
    this.clearError('placement');
  }

  protected addLayer(): void {
    if (this.layers().length >= MAX_LAYERS) return;
    this.layers.update((rows) => [...rows, { key: this.nextLayerKey++, filmId: null }]);
  }

  protected removeLayer(index: number): void {
    this.layers.update((rows) => rows.filter((_, i) => i !== index));
  }

  protected moveLayer(index: number, by: -1 | 1): void {
    this.layers.update((rows) => {
      const target = index + by;
      if (target < 0 || target >= rows.length) return rows;
      const moved = rows.slice();
      [moved[index], moved[target]] = [moved[target]!, moved[index]!];
      return moved;
    });
  }

  protected filmChosen(index: number, filmId: number): void {
    this.layers.update((rows) => rows.map((row, i) => (i === index ? { ...row, filmId } : row)));
    this.clearError('layers');
  }

  protected fabricChosen(fabricId: number): void {
    this.fabricId.set(fabricId);
    this.clearError('fabric');
  }

  protected quantityTyped(size: Size, text: string): void {
    const count = Number(text);
    this.quantities.update(({ [size]: _old, ...rest }) =>
      text.trim() !== '' && Number.isInteger(count) && count > 0 ? { ...rest, [size]: count } : rest,
    );
    this.clearError('quantities');
  }

  protected async save(): Promise<void> {
    this.problem.set(null);
    const errors = this.clientErrors();
    this.errors.set(errors);
    if (Object.keys(errors).length > 0) {
      this.problem.set('Some entries need a look: see the sentences beside them.');
      return;
    }
    const job: JobCreate = {
      name: this.name().trim(),
      designWidthMm: this.widthMm()!,
      designHeightMm: this.heightMm()!,
      placement: this.placement(),
      garment: this.garment().trim(),
      fabricId: this.fabricId()!,
      layers: this.layers().map((row) => row.filmId!),
    };
    const design = this.design();
    if (design) job.designFile = design.file;
    if (this.placement() === 'custom') {
      job.offsetXMm = mmOrNull(this.offsetXIn()) ?? 0;
      job.offsetYMm = mmOrNull(this.offsetYIn()) ?? 0;
    }
    if (this.mode() === 'roster') job.rosterLines = toRosterLineInputs(this.roster()!.rows);
    else job.quantities = this.quantities();

    this.saving.set(true);
    try {
      await firstValueFrom(this.api.createJob(Number(this.id()), job));
      await this.router.navigate(['/orders', this.id()]);
    } catch (error) {
      this.showServerErrors(error);
    } finally {
      this.saving.set(false);
    }
  }

  private async upload(file: File): Promise<void> {
    this.clearError('design');
    if (!ACCEPTED_TYPES.includes(file.type) && !/\.(svg|png)$/i.test(file.name)) {
      this.errors.update((all) => ({ ...all, design: `${file.name} is not an SVG or PNG file. Export the design as SVG or PNG.` }));
      return;
    }
    this.uploading.set(true);
    try {
      const upload = await firstValueFrom(this.api.uploadDesign(file));
      this.design.set(upload);
      if (upload.widthMm !== null) this.widthIn.set(roundInches(upload.widthMm));
      if (upload.heightMm !== null) this.heightIn.set(roundInches(upload.heightMm));
      this.clearError('size');
      if (upload.widthMm === null || upload.heightMm === null) {
        this.errors.update((all) => ({ ...all, size: 'The file does not say how big it prints. Enter its width and height.' }));
      }
    } catch (error) {
      // The rest of the form stays as it was: only the design is missing.
      this.errors.update((all) => ({ ...all, design: apiErrorSentence(error, 'The design could not be uploaded. Try again.') }));
    } finally {
      this.uploading.set(false);
    }
  }

  private clientErrors(): Partial<Record<Field, string>> {
    const errors: Partial<Record<Field, string>> = {};
    if (!this.name().trim()) errors.name = 'Give the job a name, like “Front logo”.';
    const width = this.widthIn();
    const height = this.heightIn();
    if (!(width !== null && width > 0 && height !== null && height > 0)) {
      errors.size = 'Enter the design’s width and height in inches, both more than 0.';
    }
    if (this.placement() === 'custom' && (this.offsetXIn() === null || this.offsetYIn() === null)) {
      errors.offsets = 'For a custom placement, enter how far across and down the design sits.';
    }
    if (this.layers().length === 0 || this.layers().some((row) => row.filmId === null)) {
      errors.layers = 'Pick a film and colour for every layer (at least one).';
    }
    if (!this.garment().trim()) errors.garment = 'Say what garment it goes on, like “Cotton tee”.';
    if (this.fabricId() === null) errors.fabric = 'Pick the garment’s fabric, so the press card stays under its limit.';
    if (this.mode() === 'sizes' && this.total() === 0) errors.quantities = 'Enter how many pieces of at least one size.';
    if (this.mode() === 'roster') {
      const roster = this.roster();
      if (!roster || roster.rows.length === 0) errors.roster = 'Choose a roster CSV file.';
      else if (roster.errorCount > 0) errors.roster = 'Fix the rows marked in red first.';
    }
    return errors;
  }

  private showServerErrors(error: unknown): void {
    const mapped: Partial<Record<Field, string>> = {};
    const details = error instanceof HttpErrorResponse ? (error.error as { details?: unknown } | null)?.details : undefined;
    if (Array.isArray(details)) {
      for (const detail of details as { path?: unknown; message?: unknown }[]) {
        const first = Array.isArray(detail.path) ? String(detail.path[0] ?? '') : String(detail.path ?? '').split('.')[0]!;
        const field = SERVER_PATHS[first];
        if (field && typeof detail.message === 'string') mapped[field] = detail.message;
      }
    }
    this.errors.set(mapped);
    this.problem.set(apiErrorSentence(error, 'The job could not be saved. Try again.'));
  }

  private clearError(field: Field): void {
    if (this.errors()[field] === undefined) return;
    this.errors.update(({ [field]: _cleared, ...rest }) => rest);
  }
}

/** Inches as whole millimetres, the precision the hub stores. */
function mmOrNull(inches: number | null): number | null {
  return inches === null || Number.isNaN(inches) ? null : Math.round(mmFromInches(inches));
}

function roundInches(mm: number): number {
  return Math.round(inchesFromMm(mm) * 100) / 100;
}
