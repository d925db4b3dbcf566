/** Time zone names and clocks from the browser's own IANA time zone data (Intl), so nothing is shipped or fetched. */

let zoneNames: readonly string[] | null = null;

/** Every IANA time zone the browser knows, sorted as the browser lists them, with UTC. */
export function timeZoneNames(): readonly string[] {
  if (zoneNames === null) {
    // Some engines leave UTC out of the canonical list although they accept it.
    const listed = Intl.supportedValuesOf('timeZone');
    zoneNames = listed.includes('UTC') ? listed : [...listed, 'UTC'];
  }
  return zoneNames;
}

/** The zone's name as the list spells it, or as typed for another name the browser accepts (an alias such as Asia/Kolkata); null when the browser does not know it. */
export function knownTimeZone(name: string): string | null {
  const typed = name.trim();
  // Newer engines also take an offset like '+01:00', which follows no clock change: a shop needs a named zone.
  if (!/^[A-Za-z]/.test(typed)) return null;
  const listed = timeZoneNames().find((zone) => zone.toLowerCase() === typed.toLowerCase());
  if (listed) return listed;
  try {
    // Kept as typed: browsers disagree on which of two linked names is the canonical one, and both are IANA names.
    new Intl.DateTimeFormat('en-GB', { timeZone: typed });
    return typed;
  } catch {
    // Intl throws a RangeError for a name it does not know.
    return null;
  }
}

/** The zones whose name holds every typed word (a space also matches the underscore in "New_York"), at most `limit`. */
export function matchingZones(text: string, limit = 40): string[] {
  const words = text.trim().toLowerCase().replace(/_/g, ' ').split(/[\s/]+/).filter(Boolean);
  const found: string[] = [];
  for (const zone of timeZoneNames()) {
    const haystack = zone.toLowerCase().replace(/_/g, ' ');
    if (words.every((word) => haystack.includes(word))) found.push(zone);
    if (found.length >= limit) break;
  }
  return found;
}

/** The wall clock in `zone` at `at`, as "Wednesday 14:05" (24-hour), or null for a zone the browser does not know. */
export function zoneClock(zone: string, at: Date): string | null {
  const known = knownTimeZone(zone);
  if (!known) return null;
  const parts = new Intl.DateTimeFormat('en-GB', { timeZone: known, weekday: 'long', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).formatToParts(at);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('weekday')} ${part('hour')}:${part('minute')}`;
}
