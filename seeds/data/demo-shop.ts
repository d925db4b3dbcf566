import type { ShopSettingsInput } from '../../src/shared/shop-contract';

/**
 * The demo shop's settings, an invented business. The standard rates are invented demo numbers:
 * weeding fine lettering is the slow stage, packing the quick one.
 */
export const DEMO_SHOP: ShopSettingsInput = {
  shopName: 'Bramble Yard Apparel',
  address: 'Unit 4, Bramble Yard, Tanner Row, Hollinford',
  phone: '01632 960412',
  email: 'hello@brambleyard.example',
  units: 'imperial',
  timeZone: 'Europe/London',
  shiftStart: '07:00',
  shiftEnd: '15:30',
  workingDays: [1, 2, 3, 4, 5],
  // The Christmas bank holidays of England and Wales that fall on weekdays (from memory).
  closedDays: [
    { date: '2026-12-25', note: 'Christmas Day' },
    { date: '2026-12-28', note: 'Boxing Day (substitute day)' },
    { date: '2027-12-27', note: 'Christmas Day (substitute day)' },
    { date: '2027-12-28', note: 'Boxing Day (substitute day)' },
  ],
  standardRates: { cut: 120, weed: 30, press: 45, pack: 90 },
  bagMaxPieces: 24,
  heatExposureLimitS: 45,
};
