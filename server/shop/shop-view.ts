import type { StationKind } from '../../src/shared/names';
import { isRealDay } from '../../src/shared/floor/shift-window';
import { parseWorkingDays, workingDaysText, type ClosedDay, type ShopSettings, type ShopSettingsInput } from '../../src/shared/shop-contract';
import type { ShopSettingsRow } from '../db/tables';
import type { ShopSettingsChanges } from './shop-repository';

// MariaDB gives TIME back as 'HH:MM:SS'; the API speaks 'HH:MM'.
const clock = (time: string) => time.slice(0, 5);

/** The standard good pieces per hour of each stage of work, from the row's one column per stage. */
export function standardRatesOf(row: ShopSettingsRow): Record<StationKind, number> {
  return { cut: row.standard_cut_per_hour, weed: row.standard_weed_per_hour, press: row.standard_press_per_hour, pack: row.standard_pack_per_hour };
}

/** The shop's closed days, in date order, from the row's JSON list; anything unreadable in it is left out. */
export function closedDaysOf(row: ShopSettingsRow): ClosedDay[] {
  let list: unknown;
  try {
    list = JSON.parse(row.closed_days);
  } catch {
    return [];
  }
  if (!Array.isArray(list)) return [];
  return list
    .filter((day): day is ClosedDay => typeof day?.date === 'string' && isRealDay(day.date) && typeof day.note === 'string')
    .map(({ date, note }) => ({ date, note }))
    .sort((a, b) => a.date.localeCompare(b.date));
}

/** Only the dates of the shop's closed days, as the floor's working time reads them. */
export function closedDatesOf(row: ShopSettingsRow): string[] {
  return closedDaysOf(row).map((day) => day.date);
}

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
    closedDays: closedDaysOf(row),
    standardRates: standardRatesOf(row),
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
    closed_days: JSON.stringify([...input.closedDays].sort((a, b) => a.date.localeCompare(b.date))),
    standard_cut_per_hour: input.standardRates.cut,
    standard_weed_per_hour: input.standardRates.weed,
    standard_press_per_hour: input.standardRates.press,
    standard_pack_per_hour: input.standardRates.pack,
    bag_max_pieces: input.bagMaxPieces,
    heat_exposure_limit_s: input.heatExposureLimitS,
  };
}
