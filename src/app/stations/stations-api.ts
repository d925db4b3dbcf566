import { Injectable, inject } from '@angular/core';
import { HttpClient } from '@angular/common/http';
import { Observable } from 'rxjs';
import type { StationListItem } from '../../shared/auth-contract';

export type { StationListItem };

/** Hub calls about stations. */
@Injectable({ providedIn: 'root' })
export class StationsApi {
  private readonly http = inject(HttpClient);

  /** All stations of the shop. */
  list(): Observable<StationListItem[]> {
    return this.http.get<StationListItem[]>('/api/stations');
  }
}
