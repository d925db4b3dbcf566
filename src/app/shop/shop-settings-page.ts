import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, Injector, afterNextRender, computed, inject, signal } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { AbstractControl, FormBuilder, FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatAutocompleteModule } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { map } from 'rxjs';
import { STATION_KINDS } from '../../shared/names';
import type { ShopUnits } from '../../shared/press/units';
import { ISO_WEEKDAYS, SHOP_LIMITS, WEEKDAY_NAMES, type ClosedDay, type IsoWeekday, type ShopSettings } from '../../shared/shop-contract';
import { Session } from '../auth/session';
import { apiErrorSentence, hasStatus, type ApiErrorBody } from '../core/api-error';
import { KIND_LABELS } from '../board/board-format';
import { ClosedDays } from './closed-days';
import { ShopApi } from './shop-api';
import { RATE_FIELDS, checkShop, draftFrom, placeHubDetails, sameDraft, shiftCrossesMidnight, toggledDay, type ShopDraft, type ShopField, type ShopProblems } from './shop-values';
import { matchingZones, zoneClock } from './time-zones';

const SAVED = 'Shop settings saved.';
const FIX_FIELDS = 'Some fields need a change: see the sentences beside them. Nothing was saved yet.';
const LOAD_OFFLINE =
  'The hub cannot be reached, so the shop settings cannot be shown: this screen works only while the hub answers. Check the Wi-Fi and try again.';
const SAVE_OFFLINE =
  'The hub cannot be reached, so nothing was saved: this screen works only while the hub answers. What you typed stays here; check the Wi-Fi and press Save again.';
// How often the time zone's clock beside the field moves on; it shows minutes.
const CLOCK_TICK_MS = 15_000;

const EMPTY_DRAFT: ShopDraft = {
  shopName: '',
  address: '',
  phone: '',
  email: '',
  timeZone: '',
  shiftStart: '',
  shiftEnd: '',
  workingDays: [],
  closedDays: [],
  rateCut: '',
  rateWeed: '',
  ratePress: '',
  ratePack: '',
  bagMaxPieces: '',
  heatExposureLimitS: '',
  units: 'imperial',
};

/** No network shows as status 0, or as 502-504 from the service worker or a proxy in front of the hub. */
function hubUnreachable(error: unknown): boolean {
  return hasStatus(error, 0, 502, 503, 504);
}

/** Shop settings: the owner edits the shop's details, hours, planning numbers and units; a lead reads them. */
@Component({
  selector: 'dw-shop-settings',
  imports: [ReactiveFormsModule, ClosedDays, MatAutocompleteModule, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './shop-settings-page.html',
  styleUrl: './shop-settings-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShopSettingsPage {
  private readonly api = inject(ShopApi);
  private readonly session = inject(Session);
  private readonly destroyRef = inject(DestroyRef);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly injector = inject(Injector);

  protected readonly limits = SHOP_LIMITS;
  protected readonly rates = STATION_KINDS.map((kind) => ({ kind, field: RATE_FIELDS[kind], label: KIND_LABELS[kind] }));
  protected readonly weekdays = ISO_WEEKDAYS.map((day) => ({ day, name: WEEKDAY_NAMES[day], short: WEEKDAY_NAMES[day].slice(0, 3) }));
  protected readonly canEdit = computed(() => this.session.role() === 'owner');

  protected readonly stored = signal<ShopSettings | null>(null);
  protected readonly loadProblem = signal<string | null>(null);
  protected readonly problems = signal<ShopProblems>({});
  protected readonly saveProblem = signal<string | null>(null);
  protected readonly confirmation = signal<string | null>(null);
  protected readonly saving = signal(false);

  protected readonly form = inject(FormBuilder).nonNullable.group({
    shopName: [''],
    address: [''],
    phone: [''],
    email: [''],
    timeZone: [''],
    shiftStart: [''],
    shiftEnd: [''],
    workingDays: new FormControl<IsoWeekday[]>([], { nonNullable: true }),
    closedDays: new FormControl<ClosedDay[]>([], { nonNullable: true }),
    rateCut: [''],
    rateWeed: [''],
    ratePress: [''],
    ratePack: [''],
    bagMaxPieces: [''],
    heatExposureLimitS: [''],
    units: ['imperial' as ShopUnits],
  });
  // getRawValue: a lead's form is disabled, and a disabled form's own value leaves its fields out.
  private readonly draft = toSignal(this.form.valueChanges.pipe(map(() => this.form.getRawValue())), { initialValue: EMPTY_DRAFT });

  protected readonly workingDays = computed(() => this.draft().workingDays);
  protected readonly closedDays = computed(() => this.draft().closedDays);
  protected readonly changed = computed(() => {
    const stored = this.stored();
    return stored !== null && !sameDraft(this.draft(), draftFrom(stored));
  });
  protected readonly crossesMidnight = computed(() => shiftCrossesMidnight(this.draft().shiftStart, this.draft().shiftEnd));
  protected readonly zoneOptions = computed(() => matchingZones(this.draft().timeZone));
  private readonly now = signal(new Date());
  protected readonly zoneTime = computed(() => zoneClock(this.draft().timeZone, this.now()));

  constructor() {
    for (const [field, control] of Object.entries<AbstractControl>(this.form.controls)) {
      control.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.clearProblem(field as ShopField));
    }
    this.form.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.clearConfirmationOnChange());
    const tick = setInterval(() => this.now.set(new Date()), CLOCK_TICK_MS);
    this.destroyRef.onDestroy(() => clearInterval(tick));
    void this.loadSettings();
  }

  protected async loadSettings(): Promise<void> {
    this.loadProblem.set(null);
    try {
      this.adopt(await this.api.settings());
    } catch (error) {
      this.loadProblem.set(hubUnreachable(error) ? LOAD_OFFLINE : apiErrorSentence(error, 'The shop settings could not be loaded. Try again.'));
    }
  }

  protected toggleDay(day: IsoWeekday): void {
    const control = this.form.controls.workingDays;
    if (control.disabled) return;
    control.setValue(toggledDay(control.value, day));
    control.markAsDirty();
  }

  protected closedDaysChanged(days: ClosedDay[]): void {
    const control = this.form.controls.closedDays;
    if (control.disabled) return;
    control.setValue(days);
    control.markAsDirty();
  }

  /** Checks every field, sends the settings, and keeps what the owner typed when the hub refuses. */
  protected async saveSettings(): Promise<void> {
    if (!this.canEdit() || this.saving()) return;
    this.confirmation.set(null);
    this.saveProblem.set(null);
    const check = checkShop(this.form.getRawValue());
    if (!check.ok) {
      this.problems.set(check.problems);
      this.saveProblem.set(FIX_FIELDS);
      this.showFirstProblem();
      return;
    }
    this.saving.set(true);
    try {
      this.adopt(await this.api.save(check.values));
      this.confirmation.set(SAVED);
    } catch (error) {
      this.showSaveError(error);
    } finally {
      this.saving.set(false);
    }
  }

  protected undoChanges(): void {
    const stored = this.stored();
    if (!stored) return;
    this.form.reset(draftFrom(stored));
    this.problems.set({});
    this.saveProblem.set(null);
  }

  /** Shows the stored settings in the form; a lead's copy cannot be changed. */
  private adopt(settings: ShopSettings): void {
    this.stored.set(settings);
    this.form.reset(draftFrom(settings));
    this.problems.set({});
    if (this.canEdit()) this.form.enable();
    else this.form.disable();
  }

  private showSaveError(error: unknown): void {
    if (hubUnreachable(error)) {
      this.saveProblem.set(SAVE_OFFLINE);
      return;
    }
    const body = error instanceof HttpErrorResponse ? (error.error as Partial<ApiErrorBody> | null) : null;
    const { problems, unplaced } = placeHubDetails(body?.details);
    this.problems.set(problems);
    if (Object.keys(problems).length === 0) {
      this.saveProblem.set(apiErrorSentence(error, 'The shop settings could not be saved. Try again.'));
      return;
    }
    const headline = typeof body?.error === 'string' && body.error.trim() ? body.error.trim() : FIX_FIELDS;
    this.saveProblem.set([headline, ...unplaced].join(' '));
    this.showFirstProblem();
  }

  /** Brings the first sentence about a field into view, so a problem further down the page is not missed. */
  private showFirstProblem(): void {
    afterNextRender(() => this.host.nativeElement.querySelector('.dw-field-problem')?.scrollIntoView?.({ block: 'center', behavior: 'smooth' }), { injector: this.injector });
  }

  private clearConfirmationOnChange(): void {
    const stored = this.stored();
    if (this.confirmation() && stored && !sameDraft(this.form.getRawValue(), draftFrom(stored))) this.confirmation.set(null);
  }

  private clearProblem(field: ShopField): void {
    if (this.problems()[field] === undefined) return;
    this.problems.update(({ [field]: _cleared, ...rest }) => rest);
  }
}
