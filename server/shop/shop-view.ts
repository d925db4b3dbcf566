import { parseWorkingDays, workingDaysText, type ShopSettings, type ShopSettingsInput } from '../../src/shared/shop-contract';
import type { ShopSettingsRow } from '../db/tables';
import type { ShopSettingsChanges } from './shop-repository';

// MariaDB gives TIME back as 'HH:MM:SS'; the API speaks 'HH:MM'.
const clock = (time: string) => time.slice(0, 5);

/** The stored settings as the API shows them. */
export function toShopSettings(row: ShopSettingsRow): ShopSettings {
  return {
    shopName: row.shop_name,
    address: row.address,
    phone: row.phone,
    email: row.email,
    units: row.units,
    timeZone: row.time_zone,
    shiftStart: clock(row.shift_start),
    shiftEnd: clock(row.shift_end),
    workingDays: parseWorkingDays(row.working_days),
    standardPiecesPerHour: row.standard_pieces_per_hour,
    bagMaxPieces: row.bag_max_pieces,
    heatExposureLimitS: row.heat_exposure_limit_s,
    updatedAt: row.updated_at.toISOString(),
  };
}

/** The owner's (validated) settings as the row stores them. */
export function toShopRow(input: ShopSettingsInput): ShopSettingsChanges {
  return {
    shop_name: input.shopName,
    address: input.address,
    phone: input.phone,
    email: input.email,
    units: input.units,
    time_zone: input.timeZone,
    shift_start: `${input.shiftStart}:00`,
    shift_end: `${input.shiftEnd}:00`,
    working_days: workingDaysText(input.workingDays),
    standard_pieces_per_hour: input.standardPiecesPerHour,
    bag_max_pieces: input.bagMaxPieces,
    heat_exposure_limit_s: input.heatExposureLimitS,
  };
}
