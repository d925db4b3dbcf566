import { Role, StationKind } from '../auth/session';
import { STATION_KINDS } from '../../shared/names';

/** One place in the app a person can go from the top bar. */
export interface NavEntry {
  path: string;
  label: string;
  icon: string;
  roles: readonly Role[];
  /** Shown only at these kinds of station (for an operator's station screens); everywhere when absent. */
  stationKinds?: readonly StationKind[];
}

/** Every screen the top bar can offer, and who may see it. */
export const NAV_ENTRIES: readonly NavEntry[] = [
  { path: '/board', label: 'Floor board', icon: 'floor-board', roles: ['owner', 'lead'] },
  { path: '/orders', label: 'Orders', icon: 'orders', roles: ['owner', 'lead'] },
  { path: '/stations', label: 'Stations', icon: 'tablet', roles: ['owner', 'lead'] },
  { path: '/pack', label: 'Pack check', icon: 'station-pack', roles: ['operator'], stationKinds: ['pack'] },
  { path: '/gang-planner', label: 'Gang planner', icon: 'gang-planner', roles: ['owner', 'lead'] },
  { path: '/roll-rack', label: 'Roll rack', icon: 'roll-rack', roles: ['owner', 'lead'] },
  { path: '/cut-station', label: 'Cut station', icon: 'station-cut', roles: ['operator'], stationKinds: ['cut'] },
  { path: '/gang-planner', label: 'Gang planner', icon: 'gang-planner', roles: ['operator'], stationKinds: ['cut'] },
  { path: '/roll-rack', label: 'Roll rack', icon: 'roll-rack', roles: ['operator'], stationKinds: ['cut'] },
  { path: '/weed', label: 'Weed tally', icon: 'station-weed', roles: ['operator'], stationKinds: ['weed'] },
  { path: '/spoil', label: 'Spoil report', icon: 'spoil', roles: ['operator'], stationKinds: STATION_KINDS },
  { path: '/press', label: 'Press card', icon: 'station-press', roles: ['operator'], stationKinds: ['press'] },
  { path: '/recipes', label: 'Recipe book', icon: 'recipe-book', roles: ['owner', 'lead'] },
  { path: '/people', label: 'People', icon: 'people', roles: ['owner', 'lead'] },
  // The lead's top bar is full; a lead reaches the read-only Shop settings by its address.
  { path: '/shop-settings', label: 'Shop settings', icon: 'shop-settings', roles: ['owner'] },
  { path: '/reports', label: 'Reports', icon: 'reports', roles: ['owner', 'lead'] },
  { path: '/mail', label: 'Mail outbox', icon: 'mail-outbox', roles: ['owner', 'lead'] },
];

/** The entries a person with `role` may use, at a station of `stationKind` (null away from a station). */
export function navEntriesFor(role: Role | null, stationKind: StationKind | null = null): NavEntry[] {
  return role === null
    ? []
    : NAV_ENTRIES.filter((entry) => entry.roles.includes(role) && (!entry.stationKinds || (stationKind !== null && entry.stationKinds.includes(stationKind))));
}
