import { Role } from '../auth/session';

/** One place in the app a person can go from the top bar. */
export interface NavEntry {
  path: string;
  label: string;
  icon: string;
  roles: readonly Role[];
}

/** Every screen the top bar can offer, and who may see it. */
export const NAV_ENTRIES: readonly NavEntry[] = [
  { path: '/orders', label: 'Orders', icon: 'orders', roles: ['owner', 'lead'] },
  { path: '/stations', label: 'Stations', icon: 'tablet', roles: ['owner', 'lead'] },
  { path: '/station-home', label: 'Station home', icon: 'qr-scan', roles: ['operator'] },
];

/** The entries a person with `role` may use. */
export function navEntriesFor(role: Role | null): NavEntry[] {
  return role === null ? [] : NAV_ENTRIES.filter((entry) => entry.roles.includes(role));
}
