import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { FloorReport } from '../../shared/reports-contract';

/** A range of whole days, both included, as YYYY-MM-DD. */
export interface DayRange {
  from: string;
  to: string;
}

/** Hub calls of the Reports screen. */
@Injectable({ providedIn: 'root' })
export class ReportsApi {
  private readonly http = inject(HttpClient);

  /** Pieces and spoils per station and day in the range. */
  floor(range: DayRange): Observable<FloorReport> {
    return this.http.get<FloorReport>('/api/reports/floor', { params: { from: range.from, to: range.to } });
  }
}

/** The address of the same report as a CSV file, for a plain download link. */
export function floorCsvUrl(range: DayRange): string {
  return `/api/reports/floor.csv?${new URLSearchParams({ from: range.from, to: range.to }).toString()}`;
}
