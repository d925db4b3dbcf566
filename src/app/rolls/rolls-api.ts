import { Injectable, inject } from '@angular/core';
import { HttpClient } from '@angular/common/http';
import { Observable } from 'rxjs';
import type { RollCreate, RollMovement, RollView } from '../../shared/cutting/cut-plan-contract';
import type { FilmOption } from '../../shared/intake-contract';

/** Hub calls for the Roll rack. */
@Injectable({ providedIn: 'root' })
export class RollsApi {
  private readonly http = inject(HttpClient);

  /** Every roll on the rack. */
  rolls(): Observable<RollView[]> {
    return this.http.get<RollView[]>('/api/rolls');
  }

  /** The shop's films, for the add-roll form. */
  films(): Observable<FilmOption[]> {
    return this.http.get<FilmOption[]>('/api/films');
  }

  /** Puts a roll on the rack. */
  create(roll: RollCreate): Observable<RollView> {
    return this.http.post<RollView>('/api/rolls', roll);
  }

  /** Records a physical measure of a roll. */
  measure(id: number, remainingMm: number, note: string): Observable<RollView> {
    return this.http.post<RollView>(`/api/rolls/${id}/measure`, { remainingMm, note });
  }

  /** A roll's history, newest first. */
  movements(id: number): Observable<RollMovement[]> {
    return this.http.get<RollMovement[]>(`/api/rolls/${id}/movements`);
  }
}
