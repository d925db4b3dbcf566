import { TZDate } from '@date-fns/tz';
import { getISODay } from 'date-fns';
import { WEEKDAY_NAMES, type IsoWeekday } from '../../shared/shop-contract';
import { knownTimeZone, matchingZones, timeZoneNames, zoneClock } from './time-zones';

/** The wall clock as an independent library (@date-fns/tz, which reads the same IANA rules its own way) tells it. */
function referenceClock(zone: string, at: Date): string {
  const local = new TZDate(at.getTime(), zone);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${WEEKDAY_NAMES[getISODay(local) as IsoWeekday]} ${pad(local.getHours())}:${pad(local.getMinutes())}`;
}

describe('time zones', () => {
  it('lists Europe/London and UTC among the zones the browser knows', () => {
    expect(timeZoneNames()).toEqual(expect.arrayContaining(['Europe/London', 'America/New_York', 'UTC']));
  });

  it('accepts a zone typed in any case and answers it as the list spells it', () => {
    expect(knownTimeZone('europe/london')).toBe('Europe/London');
  });

  it('keeps a linked zone name the browser accepts as it was typed', () => {
    expect(knownTimeZone('  Asia/Kolkata ')).toBe('Asia/Kolkata');
    expect(knownTimeZone('Asia/Calcutta')).toBe('Asia/Calcutta');
  });

  it('refuses a name that is not an IANA time zone, and an empty one', () => {
    expect(knownTimeZone('Mars/Olympus')).toBeNull();
    expect(knownTimeZone('GMT+25')).toBeNull();
    expect(knownTimeZone('')).toBeNull();
    expect(knownTimeZone('+01:00')).toBeNull();
  });

  it('finds zones by words typed with spaces instead of underscores', () => {
    expect(matchingZones('new york')).toContain('America/New_York');
    expect(matchingZones('london')).toEqual(['Europe/London']);
    expect(matchingZones('')).toHaveLength(40);
  });

  it('shows no clock for a zone it does not know', () => {
    expect(zoneClock('Mars/Olympus', new Date())).toBeNull();
  });

  // UK clocks go forward on the last Sunday of March at 01:00 GMT (Summer Time Order 2002; EU Directive 2000/84/EC),
  // which in 2026 is 29 March.
  it('moves the London clock from 00:59 GMT to 02:00 BST when summer time starts', () => {
    expect(zoneClock('Europe/London', new Date('2026-03-29T00:59:00Z'))).toBe('Sunday 00:59');
    expect(zoneClock('Europe/London', new Date('2026-03-29T01:00:00Z'))).toBe('Sunday 02:00');
  });

  // US daylight time starts on the second Sunday of March at 02:00 local (Energy Policy Act of 2005, s. 110): 8 March 2026, 07:00 UTC.
  it('moves the New York clock from 01:59 to 03:00 when daylight time starts', () => {
    expect(zoneClock('America/New_York', new Date('2026-03-08T06:59:00Z'))).toBe('Sunday 01:59');
    expect(zoneClock('America/New_York', new Date('2026-03-08T07:00:00Z'))).toBe('Sunday 03:00');
  });

  // India Standard Time is UTC+05:30 all year (IANA tz database, Asia/Kolkata): late Friday UTC is already Saturday there.
  it('crosses into the next day where the zone is ahead of UTC', () => {
    expect(zoneClock('Asia/Kolkata', new Date('2026-05-15T20:00:00Z'))).toBe('Saturday 01:30');
  });

  it('agrees with @date-fns/tz at every hour of a year in zones with and without summer time', () => {
    const zones = ['Europe/London', 'America/New_York', 'Australia/Sydney', 'Asia/Kolkata', 'Pacific/Chatham', 'UTC'];
    const start = Date.UTC(2026, 0, 1);
    for (const zone of zones) {
      for (let hour = 0; hour < 365 * 24; hour += 7) {
        const at = new Date(start + hour * 3_600_000 + 17 * 60_000);
        expect(`${zone} ${zoneClock(zone, at)}`).toBe(`${zone} ${referenceClock(zone, at)}`);
      }
    }
  });
});
