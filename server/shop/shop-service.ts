import type { ShopSettings, ShopSettingsInput } from '../../src/shared/shop-contract';
import type { Db } from '../db/tables';
import type { FloorBroadcast } from '../events/floor-broadcast';
import { ShopRepository } from './shop-repository';
import { toShopRow, toShopSettings } from './shop-view';

/** The shop's settings: read by owners and leads, kept by the owner. */
export class ShopService {
  private readonly shop: ShopRepository;

  constructor(
    db: Db,
    private readonly floor?: FloorBroadcast,
  ) {
    this.shop = new ShopRepository(db);
  }

  /** The settings as stored. */
  async read(): Promise<ShopSettings> {
    return toShopSettings(await this.shop.find());
  }

  /** Stores the owner's settings, tells the boards to refetch (hours, days and rates move their numbers) and answers what was stored. */
  async save(input: ShopSettingsInput): Promise<ShopSettings> {
    await this.shop.update(toShopRow(input), new Date());
    const stored = toShopSettings(await this.shop.find());
    this.floor?.shopChanged();
    return stored;
  }
}
