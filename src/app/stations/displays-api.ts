import { Injectable, inject } from '@angular/core';
import { HttpClient } from '@angular/common/http';
import { Observable } from 'rxjs';

/** A wall display that may read the floor board (GET /api/displays). */
export interface WallDisplayItem {
  id: number;
  name: string;
  createdAt: string;
}

/** A new display with its token (POST /api/displays): the token is shown this once only. */
export interface NewWallDisplay {
  id: number;
  name: string;
  deviceToken: string;
}

/** Hub calls about wall displays. */
@Injectable({ providedIn: 'root' })
export class DisplaysApi {
  private readonly http = inject(HttpClient);

  /** Displays whose token still works. */
  list(): Observable<WallDisplayItem[]> {
    return this.http.get<WallDisplayItem[]>('/api/displays');
  }

  /** Adds a display; the answer holds its token. */
  add(name: string): Observable<NewWallDisplay> {
    return this.http.post<NewWallDisplay>('/api/displays', { name });
  }

  /** Revokes a display: its screen stops showing the board. */
  revoke(id: number): Observable<void> {
    return this.http.delete<void>(`/api/displays/${encodeURIComponent(id)}`);
  }
}
