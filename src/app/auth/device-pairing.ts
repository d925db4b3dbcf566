import { Injectable, computed, inject, signal } from '@angular/core';
import { HttpClient } from '@angular/common/http';
import { firstValueFrom } from 'rxjs';
import { BROWSER_STORAGE } from '../core/browser-storage';
import type { PairReply } from '../../shared/auth-contract';
import { SessionStation } from './session';

/** Storage key of the station device token. */
export const DEVICE_TOKEN_KEY = 'dwell.deviceToken';
/** Storage key of the station this tablet is paired with, for showing its name offline. */
export const DEVICE_STATION_KEY = 'dwell.deviceStation';

/** The station device token this tablet holds, and pairing this tablet with a station. */
@Injectable({ providedIn: 'root' })
export class DevicePairing {
  private readonly http = inject(HttpClient);
  private readonly storage = inject(BROWSER_STORAGE);
  private readonly token = signal<string | null>(this.storage.getItem(DEVICE_TOKEN_KEY));
  private readonly pairedStation = signal<SessionStation | null>(readStation(this.storage));

  readonly deviceToken = this.token.asReadonly();
  readonly station = this.pairedStation.asReadonly();
  readonly paired = computed(() => this.token() !== null);

  /** Makes this tablet the given station: the hub issues a device token, kept in storage. */
  async pairThisTablet(stationId: number): Promise<SessionStation> {
    const response = await firstValueFrom(
      this.http.post<PairReply>(`/api/stations/${encodeURIComponent(stationId)}/pair`, null),
    );
    this.storage.setItem(DEVICE_TOKEN_KEY, response.deviceToken);
    this.storage.setItem(DEVICE_STATION_KEY, JSON.stringify(response.station));
    this.token.set(response.deviceToken);
    this.pairedStation.set(response.station);
    return response.station;
  }

  /** Unpairs the station on the hub (ending its operators' sessions), then forgets the token here. */
  async unpairThisTablet(): Promise<void> {
    const station = this.pairedStation();
    if (station) {
      await firstValueFrom(this.http.delete<void>(`/api/stations/${encodeURIComponent(station.id)}/pair`));
    }
    this.forget();
  }

  /** Drops this tablet's device token; it is no longer a station. */
  forget(): void {
    this.storage.removeItem(DEVICE_TOKEN_KEY);
    this.storage.removeItem(DEVICE_STATION_KEY);
    this.token.set(null);
    this.pairedStation.set(null);
  }
}

function readStation(storage: Storage): SessionStation | null {
  const raw = storage.getItem(DEVICE_STATION_KEY);
  if (!raw) {
    return null;
  }
  try {
    return JSON.parse(raw) as SessionStation;
  } catch {
    return null;
  }
}
