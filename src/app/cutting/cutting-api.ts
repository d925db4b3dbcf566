import { Injectable, inject } from '@angular/core';
import { HttpClient, HttpParams } from '@angular/common/http';
import { Observable } from 'rxjs';
import type {
  CutConfirmReply,
  CutConfirmRequest,
  CutGroup,
  CutPlanPreview,
  CutPlanRequest,
  CutterView,
  TestCutReply,
  TestCutRequest,
} from '../../shared/cutting/cut-plan-contract';

/** Hub calls for cut planning: groups, previews, confirmations, test cuts and blades. */
@Injectable({ providedIn: 'root' })
export class CuttingApi {
  private readonly http = inject(HttpClient);

  /** Queued bags grouped by the film they still need cut. */
  groups(): Observable<CutGroup[]> {
    return this.http.get<CutGroup[]>('/api/cut-groups');
  }

  /** The shop's cutters with their blade state. */
  cutters(): Observable<CutterView[]> {
    return this.http.get<CutterView[]>('/api/cutters');
  }

  /** Layout, roll, preset, estimate and test-cut advice for a plan. */
  preview(plan: CutPlanRequest): Observable<CutPlanPreview> {
    return this.http.post<CutPlanPreview>('/api/cut-plans/preview', plan);
  }

  /** Confirms a cut. */
  confirm(cut: CutConfirmRequest): Observable<CutConfirmReply> {
    return this.http.post<CutConfirmReply>('/api/cut-plans/confirm', cut);
  }

  /** Records a test cut. */
  testCut(test: TestCutRequest): Observable<TestCutReply> {
    return this.http.post<TestCutReply>('/api/test-cuts', test);
  }

  /** Records a blade change. */
  bladeChanged(cutterId: number): Observable<CutterView> {
    return this.http.post<CutterView>(`/api/cutters/${cutterId}/blade-change`, {});
  }

  /** The address that downloads the plain layout SVG for the cutter's own software. */
  layoutSvgUrl(plan: CutPlanRequest): string {
    let params = new HttpParams().set('bagIds', plan.bagIds.join(',')).set('filmId', plan.filmId).set('cutterId', plan.cutterId);
    if (plan.rollId !== undefined) params = params.set('rollId', plan.rollId);
    return `/api/cut-plans/layout.svg?${params.toString()}`;
  }
}
