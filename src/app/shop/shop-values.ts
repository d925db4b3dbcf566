import { STATION_KINDS, type StationKind } from '../../shared/names';
import { isRealDay } from '../../shared/floor/shift-window';
import { ISO_WEEKDAYS, SHOP_LIMITS, type ClosedDay, type IsoWeekday, type ShopSettings, type ShopSettingsInput } from '../../shared/shop-contract';
import type { ShopUnits } from '../../shared/press/units';
import { knownTimeZone } from './time-zones';

/** The Shop settings form as typed: text from the fields, the chosen days and units. */
export interface ShopDraft {
  shopName: string;
  address: string;
  phone: string;
  email: string;
  timeZone: string;
  shiftStart: string;
  shiftEnd: string;
  workingDays: IsoWeekday[];
  closedDays: ClosedDay[];
  /** Standard good pieces per hour at each stage of work. */
  rateCut: string;
  rateWeed: string;
  ratePress: string;
  ratePack: string;
  bagMaxPieces: string;
  heatExposureLimitS: string;
  units: ShopUnits;
}

/** A field of the form. */
export type ShopField = keyof ShopDraft;

/** A sentence per field that needs a change. */
export type ShopProblems = Partial<Record<ShopField, string>>;

/** The answer of checking a draft: the settings to send, or a sentence per bad field. */
export type ShopCheck = { ok: true; values: ShopSettingsInput } | { ok: false; problems: ShopProblems };

const SHOP_FIELDS: readonly ShopField[] = [
  'shopName',
  'address',
  'phone',
  'email',
  'timeZone',
  'shiftStart',
  'shiftEnd',
  'workingDays',
  'closedDays',
  'rateCut',
  'rateWeed',
  'ratePress',
  'ratePack',
  'bagMaxPieces',
  'heatExposureLimitS',
  'units',
];

/** The form field holding each stage's standard rate. */
export const RATE_FIELDS: Readonly<Record<StationKind, ShopField>> = { cut: 'rateCut', weed: 'rateWeed', press: 'ratePress', pack: 'ratePack' };

const TIME_OF_DAY = /^([01]\d|2[0-3]):[0-5]\d$/;
const WHOLE = /^\d+$/;
// A plain shape check; the mail server is the final judge of an address.
const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

/** The form's starting text for the stored settings. */
export function draftFrom(settings: ShopSettings): ShopDraft {
  return {
    shopName: settings.shopName,
    address: settings.address,
    phone: settings.phone,
    email: settings.email,
    timeZone: settings.timeZone,
    // The database keeps 'HH:MM:SS'; the form and the contract speak 'HH:MM'.
    shiftStart: settings.shiftStart.slice(0, 5),
    shiftEnd: settings.shiftEnd.slice(0, 5),
    workingDays: ISO_WEEKDAYS.filter((day) => settings.workingDays.includes(day)),
    closedDays: sortedClosedDays(settings.closedDays),
    rateCut: String(settings.standardRates.cut),
    rateWeed: String(settings.standardRates.weed),
    ratePress: String(settings.standardRates.press),
    ratePack: String(settings.standardRates.pack),
    bagMaxPieces: String(settings.bagMaxPieces),
    heatExposureLimitS: String(settings.heatExposureLimitS),
    units: settings.units,
  };
}

/** True when two drafts would send the same settings (surrounding spaces and day order do not count). */
export function sameDraft(a: ShopDraft, b: ShopDraft): boolean {
  return SHOP_FIELDS.every((field) => comparable(a[field]) === comparable(b[field]));
}

function comparable(value: ShopDraft[ShopField]): string {
  if (!Array.isArray(value)) return value.trim();
  return value.every((item) => typeof item === 'number') ? [...value].sort((x, y) => x - y).join(',') : JSON.stringify(sortedClosedDays(value as ClosedDay[]));
}

/** Closed days in date order, notes trimmed. */
export function sortedClosedDays(days: readonly ClosedDay[]): ClosedDay[] {
  return days.map(({ date, note }) => ({ date, note: note.trim() })).sort((a, b) => a.date.localeCompare(b.date));
}

/** Why a closed day cannot be added to the list, or null when it can. */
export function closedDayProblem(days: readonly ClosedDay[], date: string, note: string): string | null {
  if (!isRealDay(date)) return 'Pick the date the shop is closed.';
  if (days.some((day) => day.date === date)) return `${date} is already a closed day.`;
  if (days.length >= SHOP_LIMITS.closedDaysMax) return `Keep at most ${SHOP_LIMITS.closedDaysMax} closed days: remove the ones that have passed.`;
  if (note.trim().length > SHOP_LIMITS.closedDayNoteMax) return `A note is at most ${SHOP_LIMITS.closedDayNoteMax} characters.`;
  return null;
}

/** True when the shift ends before it starts on the clock, so it ends on the next day (the hub refuses an end equal to the start). */
export function shiftCrossesMidnight(start: string, end: string): boolean {
  return TIME_OF_DAY.test(start) && TIME_OF_DAY.test(end) && end < start;
}

/** Adds or removes a working day, keeping the days in week order. */
export function toggledDay(days: readonly IsoWeekday[], day: IsoWeekday): IsoWeekday[] {
  return ISO_WEEKDAYS.filter((d) => (d === day ? !days.includes(d) : days.includes(d)));
}

function text(value: string, max: number, what: string, field: ShopField, problems: ShopProblems): string {
  const trimmed = value.trim();
  if (trimmed.length > max) problems[field] = `${what} is at most ${max} characters; this one has ${trimmed.length}.`;
  return trimmed;
}

function whole(value: string, limits: { min: number; max: number }, what: string, field: ShopField, problems: ShopProblems): number {
  const trimmed = value.trim();
  const number = Number(trimmed);
  if (!WHOLE.test(trimmed) || number < limits.min || number > limits.max) {
    problems[field] = `${what} is a whole number from ${limits.min} to ${limits.max}${trimmed ? `; “${trimmed}” is not` : ''}.`;
  }
  return number;
}

/** Checks a draft against the hub's limits (SHOP_LIMITS) and turns it into the settings to send. */
export function checkShop(draft: ShopDraft): ShopCheck {
  const problems: ShopProblems = {};
  const shopName = text(draft.shopName, SHOP_LIMITS.shopNameMax, "The shop's name", 'shopName', problems);
  if (!shopName) problems.shopName = "Enter the shop's name; customers see it at the top of their mail.";
  const address = text(draft.address, SHOP_LIMITS.addressMax, 'The address', 'address', problems);
  const phone = text(draft.phone, SHOP_LIMITS.phoneMax, 'The phone number', 'phone', problems);
  const email = text(draft.email, SHOP_LIMITS.emailMax, 'The e-mail address', 'email', problems);
  if (!problems.email && email !== '' && !EMAIL.test(email)) {
    problems.email = "Enter the shop's e-mail like hello@yourshop.example, or leave it empty.";
  }

  const typedZone = draft.timeZone.trim();
  const timeZone = knownTimeZone(typedZone);
  if (!timeZone || timeZone.length > SHOP_LIMITS.timeZoneMax) {
    problems.timeZone = typedZone
      ? `“${typedZone}” is not a time zone this tablet knows. Pick one from the list, like Europe/London.`
      : 'Pick the time zone of the shop from the list, like Europe/London.';
  }
  if (!TIME_OF_DAY.test(draft.shiftStart)) problems.shiftStart = 'Enter the time the shift starts, like 07:00.';
  if (!TIME_OF_DAY.test(draft.shiftEnd)) problems.shiftEnd = 'Enter the time the shift ends, like 15:30.';
  else if (draft.shiftEnd === draft.shiftStart) problems.shiftEnd = `The shift cannot end when it starts (${draft.shiftStart}): give it a different end time.`;
  const workingDays = ISO_WEEKDAYS.filter((day) => draft.workingDays.includes(day));
  if (workingDays.length === 0) problems.workingDays = 'Pick at least one day the shop works.';
  const closedDays = sortedClosedDays(draft.closedDays);
  if (closedDays.length > SHOP_LIMITS.closedDaysMax) problems.closedDays = `Keep at most ${SHOP_LIMITS.closedDaysMax} closed days: remove the ones that have passed.`;

  const standardRates = Object.fromEntries(
    STATION_KINDS.map((kind) => [kind, whole(draft[RATE_FIELDS[kind]] as string, SHOP_LIMITS.standardRate, `The standard rate at ${kind}`, RATE_FIELDS[kind], problems)]),
  ) as Record<StationKind, number>;
  const bagMaxPieces = whole(draft.bagMaxPieces, SHOP_LIMITS.bagMaxPieces, 'Pieces per bag', 'bagMaxPieces', problems);
  const heatExposureLimitS = whole(draft.heatExposureLimitS, SHOP_LIMITS.heatExposureLimitS, 'The heat exposure limit in seconds', 'heatExposureLimitS', problems);
  if (draft.units !== 'imperial' && draft.units !== 'metric') problems.units = 'Pick imperial or metric.';

  if (Object.keys(problems).length > 0) return { ok: false, problems };
  return {
    ok: true,
    values: {
      shopName,
      address,
      phone,
      email,
      units: draft.units,
      timeZone: timeZone!,
      shiftStart: draft.shiftStart,
      shiftEnd: draft.shiftEnd,
      workingDays,
      closedDays,
      standardRates,
      bagMaxPieces,
      heatExposureLimitS,
    },
  };
}

/** The hub's `details` of a refused save, placed by field; messages naming no field of the form are left over. */
export function placeHubDetails(details: unknown): { problems: ShopProblems; unplaced: string[] } {
  const problems: ShopProblems = {};
  const unplaced: string[] = [];
  if (!Array.isArray(details)) return { problems, unplaced };
  for (const detail of details as { path?: unknown; message?: unknown }[]) {
    const message = typeof detail?.message === 'string' ? detail.message.trim() : '';
    if (!message) continue;
    // A path is 'timeZone', or for a list 'workingDays.0' / ['workingDays', 0]: the field is its first part;
    // 'standardRates.weed' is the weed rate's field, and 'standardRates' alone the first rate's.
    const parts: unknown[] = Array.isArray(detail.path) ? detail.path : typeof detail.path === 'string' ? detail.path.split('.') : [];
    const rateKind = STATION_KINDS.find((kind) => kind === parts[1]) ?? 'cut';
    const first = parts[0] === 'standardRates' ? RATE_FIELDS[rateKind] : parts[0];
    const field = SHOP_FIELDS.find((name) => name === first);
    if (field && !problems[field]) problems[field] = message;
    else if (!field) unplaced.push(message);
  }
  return { problems, unplaced };
}
