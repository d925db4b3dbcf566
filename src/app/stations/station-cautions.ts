import { PRESS_CAUTIONS } from '../../shared/press/cautions';
import type { StationKind } from '../auth/session';

const FOLLOW_RULES = "Follow the equipment supplier's instructions and your local workplace safety rules.";

/** The short safety reminders a station's home shows for the work done there; none for packing. */
export const STATION_CAUTIONS: Readonly<Record<StationKind, readonly string[]>> = {
  cut: [
    'Sharp blade: hold the blade holder by its body when changing the blade, and keep the cap on a loose blade.',
    'Moving carriage: keep fingers and sleeves away from the carriage and pinch rollers while the cutter runs.',
    FOLLOW_RULES,
  ],
  weed: [
    'Sharp tools: point weeding hooks and knives away from you, and put them down before reaching for the next sheet.',
    FOLLOW_RULES,
  ],
  press: PRESS_CAUTIONS,
  pack: [],
};
