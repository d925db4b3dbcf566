import { z } from 'zod';
import { checkTimeZone, isRealDay, parseClock } from '../../src/shared/floor/shift-window';
import { ISO_WEEKDAYS, SHOP_LIMITS, WEEKDAY_NAMES, type IsoWeekday } from '../../src/shared/shop-contract';

const text = (what: string, max: number) =>
  z.string({ error: `Write the ${what} as text, or leave it empty.` }).trim().max(max, `The ${what} is at most ${max} characters.`);

const whole = (what: string, { min, max }: { min: number; max: number }) => {
  const message = `${what} is a whole number from ${min} to ${max}.`;
  return z.number({ error: message }).int(message).min(min, message).max(max, message);
};

const emailMessage = "Enter the shop's e-mail like hello@shop.example, or leave it empty.";
const email = text('e-mail', SHOP_LIMITS.emailMax).refine((value) => value === '' || z.email().safeParse(value).success, emailMessage);

const timeZone = z
  .string({ error: 'Choose the time zone, e.g. Europe/London.' })
  .trim()
  .min(1, 'Choose the time zone, e.g. Europe/London.')
  .max(SHOP_LIMITS.timeZoneMax, `A time zone name is at most ${SHOP_LIMITS.timeZoneMax} characters.`)
  .transform((name, ctx) => {
    try {
      // Newer runtimes also take '+01:00', which follows no clock change: the shop needs a named zone.
      if (!/^[A-Za-z]/.test(name)) throw new RangeError(`"${name}" is not a known time zone: use an IANA name such as Europe/London.`);
      checkTimeZone(name);
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      ctx.addIssue({ code: 'custom', message: error.message });
      return z.NEVER;
    }
    // Stored as the zone list spells it, so 'europe/london' reads back as Europe/London; a valid name the
    // list leaves out (a newer alias such as Asia/Kolkata on an older runtime) is kept as the owner chose it.
    return Intl.supportedValuesOf('timeZone').find((known) => known.toLowerCase() === name.toLowerCase()) ?? name;
  });

const timeOfDay = (what: string) =>
  z
    .string({ error: `Write the ${what} as HH:MM, e.g. 07:00.` })
    .trim()
    .superRefine((clock, ctx) => {
      try {
        parseClock(clock);
      } catch (error) {
        if (!(error instanceof RangeError)) throw error;
        ctx.addIssue({ code: 'custom', message: `The ${what} ${error.message}` });
        return;
      }
      if (clock.length !== 5) ctx.addIssue({ code: 'custom', message: `Write the ${what} as HH:MM, without seconds.` });
    });

const weekdayMessage = 'Working days are ISO weekday numbers from 1 (Monday) to 7 (Sunday).';
const workingDays = z
  .array(z.literal(ISO_WEEKDAYS, { error: weekdayMessage }), { error: 'Tick the days the shift runs.' })
  .min(1, 'Tick at least one working day: the floor plans its shifts on them.')
  .superRefine((days, ctx) => {
    const twice = days.find((day, index) => days.indexOf(day) !== index);
    if (twice !== undefined) ctx.addIssue({ code: 'custom', message: `Each working day is listed once: ${WEEKDAY_NAMES[twice]} is there twice.` });
  })
  .transform((days): IsoWeekday[] => [...days].sort((a, b) => a - b));

const closedDay = z.object(
  {
    date: z.string({ error: 'Write a closed day as YYYY-MM-DD, e.g. 2026-12-25.' }).refine(isRealDay, 'A closed day is a date that exists, written YYYY-MM-DD, e.g. 2026-12-25.'),
    note: text('note on a closed day', SHOP_LIMITS.closedDayNoteMax).default(''),
  },
  { error: 'A closed day has a date and a note.' },
);

const closedDays = z
  .array(closedDay, { error: 'Closed days are a list of dates with a note each.' })
  .max(SHOP_LIMITS.closedDaysMax, `Keep at most ${SHOP_LIMITS.closedDaysMax} closed days: remove the ones that have passed.`)
  .superRefine((days, ctx) => {
    const dates = days.map((day) => day.date);
    const twice = dates.find((date, index) => dates.indexOf(date) !== index);
    if (twice !== undefined) ctx.addIssue({ code: 'custom', message: `Each closed day is listed once: ${twice} is there twice.` });
  })
  .transform((days) => [...days].sort((a, b) => a.date.localeCompare(b.date)));

/**
 * PUT /api/shop: every setting, text trimmed. Fields the screen does not send (such as updatedAt) are
 * dropped, as every other body schema here does. A shift whose end is before its start runs past midnight.
 */
export const shopSettingsInput = z
  .object({
    shopName: z.string({ error: "Enter the shop's name." }).trim().min(1, "Enter the shop's name.").max(SHOP_LIMITS.shopNameMax, `The shop's name is at most ${SHOP_LIMITS.shopNameMax} characters.`),
    address: text('address', SHOP_LIMITS.addressMax),
    phone: text('phone number', SHOP_LIMITS.phoneMax),
    email,
    units: z.enum(['imperial', 'metric'], { error: 'Choose imperial (°F, inches, psi) or metric (°C, mm, kPa) units.' }),
    timeZone,
    shiftStart: timeOfDay('shift start'),
    shiftEnd: timeOfDay('shift end'),
    workingDays,
    closedDays,
    standardRates: z.object(
      {
        cut: whole('The standard rate at cut', SHOP_LIMITS.standardRate),
        weed: whole('The standard rate at weed', SHOP_LIMITS.standardRate),
        press: whole('The standard rate at press', SHOP_LIMITS.standardRate),
        pack: whole('The standard rate at pack', SHOP_LIMITS.standardRate),
      },
      { error: 'Give a standard rate for each stage: cut, weed, press and pack.' },
    ),
    bagMaxPieces: whole('The most pieces in one bag', SHOP_LIMITS.bagMaxPieces),
    heatExposureLimitS: whole('The heat exposure limit in seconds', SHOP_LIMITS.heatExposureLimitS),
  })
  .superRefine((shop, ctx) => {
    if (shop.shiftStart === shop.shiftEnd) {
      ctx.addIssue({ code: 'custom', path: ['shiftEnd'], message: `The shift cannot end when it starts (${shop.shiftStart}): give it a different end time.` });
    }
  });
