import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { ShopSettings, ShopSettingsInput } from '../../shared/shop-contract';

/** The hub's Shop settings calls. */
@Injectable({ providedIn: 'root' })
export class ShopApi {
  private readonly http = inject(HttpClient);

  /** The shop's stored settings (owner and lead). */
  settings(): Promise<ShopSettings> {
    return firstValueFrom(this.http.get<ShopSettings>('/api/shop'));
  }

  /** Replaces the shop's settings (owner only) and answers them as stored. */
  save(settings: ShopSettingsInput): Promise<ShopSettings> {
    return firstValueFrom(this.http.put<ShopSettings>('/api/shop', settings));
  }
}
