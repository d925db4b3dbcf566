import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { ActivatedRoute } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { CutGroup, CutPlanPreview, CutterView } from '../../shared/cutting/cut-plan-contract';
import type { StationTicket } from '../../shared/events-contract';
import { BLADE_EXPOSURE_GUIDANCE, type TestCutRung } from '../../shared/cutting/test-cut';
import { apiErrorSentence } from '../core/api-error';
import { BagScan } from '../scan/bag-scan';
import { CuttingApi } from './cutting-api';
import { PlanSummary } from './plan-summary';
import { TestCutLadder } from './test-cut-ladder';

/** Cut station: the scanned bags (or the planner's gang), preset, test-cut ladder, blade, confirm. */
@Component({
  selector: 'dw-cut-station',
  imports: [MatButtonModule, MatIconModule, BagScan, PlanSummary, TestCutLadder],
  templateUrl: './cut-station.html',
  styleUrl: './cut-station.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CutStation {
  private readonly api = inject(CuttingApi);
  private readonly route = inject(ActivatedRoute);

  protected readonly bladeGuidance = BLADE_EXPOSURE_GUIDANCE;
  protected readonly cutter = signal<CutterView | null>(null);
  protected readonly filmId = signal<number | null>(null);
  protected readonly bagIds = signal<number[]>([]);
  protected readonly preview = signal<CutPlanPreview | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly testSentence = signal<string | null>(null);
  protected readonly done = signal<string | null>(null);
  protected readonly busy = signal(false);
  /** Film the test cut took, deducted with the cut. */
  protected readonly testCutMm = signal(0);

  protected readonly bladePercent = computed(() => {
    const c = this.preview()?.cutter ?? this.cutter();
    return c ? Math.min(100, Math.round((c.sinceTestMm / c.testCutEveryMm) * 100)) : 0;
  });
  protected readonly bladeCutter = computed(() => this.preview()?.cutter ?? this.cutter());

  constructor() {
    void this.start();
  }

  private async start(): Promise<void> {
    try {
      const cutters = await firstValueFrom(this.api.cutters());
      this.cutter.set(cutters[0] ?? null);
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The cutter could not be loaded. Try again.'));
      return;
    }
    const params = this.route.snapshot.queryParamMap;
    const film = Number(params.get('film'));
    const bags = (params.get('bags') ?? '').split(',').map(Number).filter((n) => Number.isInteger(n) && n > 0);
    if (film > 0 && bags.length > 0) {
      this.filmId.set(film);
      this.bagIds.set(bags);
      await this.refreshPreview();
      return;
    }
    // Opened from a bag label's link.
    const bag = Number(params.get('bag'));
    if (Number.isInteger(bag) && bag > 0) await this.addBag(bag, 'This bag');
  }

  /** A bag was scanned: add it to the gang on the film it still needs (the gang's film first). */
  protected async bagScanned(found: StationTicket | string): Promise<void> {
    if (typeof found === 'string') return;
    await this.addBag(found.bag.id, `Bag ${found.bag.code}`);
  }

  private async addBag(bagId: number, named: string): Promise<void> {
    this.done.set(null);
    this.problem.set(null);
    let groups: CutGroup[];
    try {
      groups = await firstValueFrom(this.api.groups());
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The bag could not be looked up. Try again.'));
      return;
    }
    const holding = groups.filter((g) => g.bags.some((b) => b.bagId === bagId));
    const group = holding.find((g) => g.filmId === this.filmId()) ?? holding[0];
    if (!group) {
      this.problem.set(`${named} is not waiting to be cut.`);
      return;
    }
    if (group.filmId !== this.filmId()) {
      this.filmId.set(group.filmId);
      this.bagIds.set([bagId]);
    } else if (!this.bagIds().includes(bagId)) {
      this.bagIds.update((ids) => [...ids, bagId]);
    }
    await this.refreshPreview();
  }

  /** Takes a bag out of the gang. */
  protected async bagRemoved(bagId: number): Promise<void> {
    this.bagIds.update((ids) => ids.filter((id) => id !== bagId));
    await this.refreshPreview();
  }

  /** Records the ladder's result. */
  protected async testCutRecorded(rungs: TestCutRung[]): Promise<void> {
    const preview = this.preview();
    if (!preview) return;
    this.busy.set(true);
    try {
      const reply = await firstValueFrom(
        this.api.testCut({ cutterId: preview.cutter.id, filmTypeId: preview.preset.filmTypeId, bagId: this.bagIds()[0], steps: rungs }),
      );
      this.testSentence.set(reply.sentence);
      this.testCutMm.update((mm) => mm + preview.testCutFilmMm);
      await this.refreshPreview();
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The test cut could not be recorded. Try again.'));
    } finally {
      this.busy.set(false);
    }
  }

  /** A fresh blade went in. */
  protected async bladeChangedPressed(): Promise<void> {
    const cutter = this.bladeCutter();
    if (!cutter) return;
    this.busy.set(true);
    try {
      this.cutter.set(await firstValueFrom(this.api.bladeChanged(cutter.id)));
      this.testSentence.set(null);
      await this.refreshPreview();
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The blade change could not be recorded. Try again.'));
    } finally {
      this.busy.set(false);
    }
  }

  /** Confirms the cut: the roll is deducted (with any test cut) and the bags move on. */
  protected async confirmPressed(): Promise<void> {
    const preview = this.preview();
    const filmId = this.filmId();
    if (!preview?.roll || filmId === null) return;
    this.busy.set(true);
    this.problem.set(null);
    try {
      const reply = await firstValueFrom(
        this.api.confirm({
          bagIds: this.bagIds(),
          filmId,
          rollId: preview.roll.id,
          cutterId: preview.cutter.id,
          lengthMm: preview.layout.lengthUsedMm,
          testCutMm: this.testCutMm(),
        }),
      );
      this.done.set(reply.sentence);
      this.cutter.set(reply.cutter);
      this.preview.set(null);
      this.bagIds.set([]);
      this.testCutMm.set(0);
      this.testSentence.set(null);
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The cut could not be confirmed. Try again.'));
    } finally {
      this.busy.set(false);
    }
  }

  private async refreshPreview(): Promise<void> {
    const filmId = this.filmId();
    const cutter = this.cutter();
    if (filmId === null || !cutter || this.bagIds().length === 0) {
      this.preview.set(null);
      return;
    }
    try {
      this.preview.set(await firstValueFrom(this.api.preview({ bagIds: this.bagIds(), filmId, cutterId: cutter.id })));
      this.problem.set(null);
    } catch (error) {
      this.preview.set(null);
      this.problem.set(apiErrorSentence(error, 'The layout could not be made. Try again.'));
    }
  }
}
