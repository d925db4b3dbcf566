import { getISODay } from 'date-fns';
import { SHOP_LIMITS, WEEKDAY_NAMES, type IsoWeekday, type ShopSettings } from '../../shared/shop-contract';
import { checkShop, closedDayProblem, draftFrom, placeHubDetails, sameDraft, shiftCrossesMidnight, toggledDay, type ShopDraft } from './shop-values';
import { DEMO_SHOP } from '../../../seeds/data/demo-shop';

// The demo shop (an invented business), as the hub would answer it.
const STORED: ShopSettings = { ...DEMO_SHOP, updatedAt: '2026-05-11T08:00:00.000Z' };

const draft = (changes: Partial<ShopDraft> = {}): ShopDraft => ({ ...draftFrom(STORED), ...changes });

describe('shop values', () => {
  it('turns the stored settings into a form and back into the same settings', () => {
    const check = checkShop(draft());
    const { updatedAt: _stamp, ...input } = STORED;
    expect(check).toEqual({ ok: true, values: input });
  });

  it('reads a stored shift time with seconds as hours and minutes', () => {
    expect(draftFrom({ ...STORED, shiftStart: '07:00:00' }).shiftStart).toBe('07:00');
  });

  it('sends trimmed text and the working days in week order', () => {
    const check = checkShop(draft({ shopName: '  Bramble Yard Apparel ', workingDays: [6, 1, 3] }));
    expect(check.ok && check.values.shopName).toBe('Bramble Yard Apparel');
    expect(check.ok && check.values.workingDays).toEqual([1, 3, 6]);
  });

  // ISO 8601 numbers the weekdays from Monday = 1 to Sunday = 7; date-fns' getISODay is an independent reading of it.
  it('names the ISO weekdays as ISO 8601 numbers them', () => {
    expect(WEEKDAY_NAMES[getISODay(new Date(2026, 4, 11)) as IsoWeekday]).toBe('Monday'); // 11 May 2026 is a Monday
    expect(WEEKDAY_NAMES[getISODay(new Date(2026, 4, 16)) as IsoWeekday]).toBe('Saturday');
    expect(WEEKDAY_NAMES[getISODay(new Date(2026, 4, 17)) as IsoWeekday]).toBe('Sunday');
  });

  it('adds a day in week order and takes it away again', () => {
    expect(toggledDay([1, 2, 3, 4, 5], 6)).toEqual([1, 2, 3, 4, 5, 6]);
    expect(toggledDay([2, 4, 7], 1)).toEqual([1, 2, 4, 7]);
    expect(toggledDay([1, 2, 3, 4, 5], 3)).toEqual([1, 2, 4, 5]);
  });

  it('asks for at least one working day', () => {
    const check = checkShop(draft({ workingDays: [] }));
    expect(check.ok).toBe(false);
    expect(!check.ok && check.problems.workingDays).toBe('Pick at least one day the shop works.');
  });

  it('refuses a time zone the tablet does not know and names what was typed', () => {
    const check = checkShop(draft({ timeZone: 'Mars/Olympus' }));
    expect(!check.ok && check.problems.timeZone).toContain('“Mars/Olympus” is not a time zone');
  });

  it('accepts a time zone typed in lower case and sends the listed spelling', () => {
    const check = checkShop(draft({ timeZone: 'america/new_york' }));
    expect(check.ok && check.values.timeZone).toBe('America/New_York');
  });

  it('holds each number to the same bounds as the hub, both ends included', () => {
    const bounds = [
      ['rateCut', SHOP_LIMITS.standardRate],
      ['rateWeed', SHOP_LIMITS.standardRate],
      ['ratePress', SHOP_LIMITS.standardRate],
      ['ratePack', SHOP_LIMITS.standardRate],
      ['bagMaxPieces', SHOP_LIMITS.bagMaxPieces],
      ['heatExposureLimitS', SHOP_LIMITS.heatExposureLimitS],
    ] as const;
    for (const [field, { min, max }] of bounds) {
      expect(checkShop(draft({ [field]: String(min) })).ok).toBe(true);
      expect(checkShop(draft({ [field]: String(max) })).ok).toBe(true);
      for (const bad of [String(min - 1), String(max + 1), '4.5', 'twelve', '']) {
        const check = checkShop(draft({ [field]: bad }));
        expect(!check.ok && check.problems[field]).toContain(`from ${min} to ${max}`);
      }
    }
  });

  it('holds text to the hub limits, asks for the name, and takes an e-mail of the right shape or none', () => {
    const long = checkShop(draft({ address: 'x'.repeat(SHOP_LIMITS.addressMax + 1), phone: '1'.repeat(SHOP_LIMITS.phoneMax + 1) }));
    expect(!long.ok && long.problems.address).toBe(`The address is at most ${SHOP_LIMITS.addressMax} characters; this one has ${SHOP_LIMITS.addressMax + 1}.`);
    expect(!long.ok && long.problems.phone).toContain(`at most ${SHOP_LIMITS.phoneMax}`);
    const empty = checkShop(draft({ shopName: ' ', email: 'hello at brambleyard' }));
    expect(!empty.ok && empty.problems.shopName).toContain("Enter the shop's name");
    expect(!empty.ok && empty.problems.email).toContain('like hello@yourshop.example');
    expect(checkShop(draft({ address: '', phone: '', email: '' })).ok).toBe(true);
  });

  it('asks for shift times as hours and minutes', () => {
    const check = checkShop(draft({ shiftStart: '7am', shiftEnd: '24:00' }));
    expect(!check.ok && check.problems.shiftStart).toBe('Enter the time the shift starts, like 07:00.');
    expect(!check.ok && check.problems.shiftEnd).toBe('Enter the time the shift ends, like 15:30.');
  });

  it('refuses a shift that ends when it starts, as the hub does', () => {
    const check = checkShop(draft({ shiftStart: '07:00', shiftEnd: '07:00' }));
    expect(!check.ok && check.problems.shiftEnd).toBe('The shift cannot end when it starts (07:00): give it a different end time.');
  });

  it('says a shift runs past midnight when it ends before it starts on the clock', () => {
    expect(shiftCrossesMidnight('22:00', '06:00')).toBe(true);
    expect(shiftCrossesMidnight('00:01', '00:00')).toBe(true);
    expect(shiftCrossesMidnight('07:00', '07:00')).toBe(false);
    expect(shiftCrossesMidnight('07:00', '15:30')).toBe(false);
    expect(shiftCrossesMidnight('', '06:00')).toBe(false);
  });

  it('counts only real changes as unsaved ones', () => {
    expect(sameDraft(draft(), draft({ shopName: 'Bramble Yard Apparel ', workingDays: [5, 4, 3, 2, 1] }))).toBe(true);
    expect(sameDraft(draft(), draft({ workingDays: [1, 2, 3, 4, 5, 6] }))).toBe(false);
    expect(sameDraft(draft(), draft({ units: 'metric' }))).toBe(false);
  });

  it('takes a closed day that exists and is not listed yet, and counts only a real change to the list as unsaved', () => {
    const listed = STORED.closedDays;
    expect(closedDayProblem(listed, '2027-01-01', "New Year's Day")).toBeNull();
    expect(closedDayProblem(listed, '2026-12-25', '')).toBe('2026-12-25 is already a closed day.');
    expect(closedDayProblem(listed, '2027-02-29', '')).toBe('Pick the date the shop is closed.'); // 2027 is no leap year (Gregorian calendar)
    expect(closedDayProblem(listed, '', '')).toBe('Pick the date the shop is closed.');
    expect(closedDayProblem(listed, '2027-01-01', 'x'.repeat(SHOP_LIMITS.closedDayNoteMax + 1))).toContain(`at most ${SHOP_LIMITS.closedDayNoteMax} characters`);
    expect(sameDraft(draft(), draft({ closedDays: [...listed].reverse() }))).toBe(true);
    expect(sameDraft(draft(), draft({ closedDays: listed.slice(1) }))).toBe(false);
  });

  it('places the hub refusals by field and keeps the ones naming no field', () => {
    const placed = placeHubDetails([
      { path: 'timeZone', message: 'Use an IANA time zone name.' },
      { path: ['workingDays', 0], message: 'A working day is a number from 1 to 7.' },
      { path: 'workingDays.1', message: 'A second sentence for the same field.' },
      { path: 'colour', message: 'The hub does not keep a colour.' },
      { path: 'email' },
    ]);
    expect(placed.problems).toEqual({ timeZone: 'Use an IANA time zone name.', workingDays: 'A working day is a number from 1 to 7.' });
    expect(placed.unplaced).toEqual(['The hub does not keep a colour.']);
    expect(placeHubDetails([{ path: 'standardRates.weed', message: 'Too slow.' }]).problems).toEqual({ rateWeed: 'Too slow.' });
    expect(placeHubDetails([{ path: 'standardRates', message: 'Give all four.' }]).problems).toEqual({ rateCut: 'Give all four.' });
    expect(placeHubDetails(undefined)).toEqual({ problems: {}, unplaced: [] });
  });
});
