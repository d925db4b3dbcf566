import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { Router } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { CutGroup, CutPlanPreview, CutterView } from '../../shared/cutting/cut-plan-contract';
import { apiErrorSentence } from '../core/api-error';
import { CuttingApi } from './cutting-api';
import { PlanSummary } from './plan-summary';

/** Gang planner: pick bags that share a film, see the layout, roll and preset, download the SVG, confirm. */
@Component({
  selector: 'dw-gang-planner',
  imports: [MatButtonModule, MatIconModule, PlanSummary],
  templateUrl: './gang-planner.html',
  styleUrl: './gang-planner.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class GangPlanner {
  private readonly api = inject(CuttingApi);
  private readonly router = inject(Router);

  protected readonly groups = signal<CutGroup[]>([]);
  protected readonly cutters = signal<CutterView[]>([]);
  protected readonly filmId = signal<number | null>(null);
  protected readonly picked = signal<ReadonlySet<number>>(new Set());
  protected readonly preview = signal<CutPlanPreview | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly done = signal<string | null>(null);
  protected readonly busy = signal(false);

  protected readonly group = computed(() => this.groups().find((g) => g.filmId === this.filmId()) ?? null);
  protected readonly cutter = computed(() => this.cutters()[0] ?? null);
  protected readonly downloadUrl = computed(() => {
    const plan = this.plan();
    return plan ? this.api.layoutSvgUrl(plan) : null;
  });

  constructor() {
    void this.load();
  }

  /** Loads the suggested groups and the cutters. */
  async load(): Promise<void> {
    try {
      const [groups, cutters] = await Promise.all([firstValueFrom(this.api.groups()), firstValueFrom(this.api.cutters())]);
      this.groups.set(groups);
      this.cutters.set(cutters);
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The queued bags could not be loaded. Check the hub is running and try again.'));
    }
  }

  /** Picks a film's group and every bag in it. */
  protected groupChosen(group: CutGroup): void {
    this.filmId.set(group.filmId);
    this.picked.set(new Set(group.bags.map((b) => b.bagId)));
    this.done.set(null);
    void this.refreshPreview();
  }

  /** Adds a bag to the gang or takes it out. */
  protected bagToggled(bagId: number): void {
    const next = new Set(this.picked());
    if (next.has(bagId)) next.delete(bagId);
    else next.add(bagId);
    this.picked.set(next);
    void this.refreshPreview();
  }

  protected isPicked(bagId: number): boolean {
    return this.picked().has(bagId);
  }

  /** Asks the hub for the layout of the picked bags. */
  async refreshPreview(): Promise<void> {
    const plan = this.plan();
    this.problem.set(null);
    if (!plan) {
      this.preview.set(null);
      return;
    }
    this.busy.set(true);
    try {
      this.preview.set(await firstValueFrom(this.api.preview(plan)));
    } catch (error) {
      this.preview.set(null);
      this.problem.set(apiErrorSentence(error, 'The layout could not be made. Try again.'));
    } finally {
      this.busy.set(false);
    }
  }

  /** Confirms the cut on the suggested roll. */
  protected async confirmPressed(): Promise<void> {
    const preview = this.preview();
    const plan = this.plan();
    if (!preview?.roll || !plan || preview.rollChoice.kind !== 'roll') return;
    this.busy.set(true);
    this.problem.set(null);
    try {
      const reply = await firstValueFrom(this.api.confirm({ ...plan, rollId: preview.roll.id, lengthMm: preview.layout.lengthUsedMm }));
      this.done.set(reply.sentence);
      this.preview.set(null);
      this.picked.set(new Set());
      this.filmId.set(null);
      await this.load();
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The cut could not be confirmed. Try again.'));
    } finally {
      this.busy.set(false);
    }
  }

  /** Hands the gang to the cut station screen (on this tablet). */
  protected async toStationPressed(): Promise<void> {
    const plan = this.plan();
    if (!plan) return;
    await this.router.navigate(['/cut-station'], { queryParams: { film: plan.filmId, bags: plan.bagIds.join(',') } });
  }

  private plan() {
    const filmId = this.filmId();
    const cutter = this.cutter();
    const group = this.group();
    const bagIds = group ? group.bags.map((b) => b.bagId).filter((id) => this.picked().has(id)) : [];
    return filmId !== null && cutter && bagIds.length > 0 ? { bagIds, filmId, cutterId: cutter.id } : null;
  }
}
