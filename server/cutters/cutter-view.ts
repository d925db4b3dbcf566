import type { CutterView } from '../../src/shared/cutting/cut-plan-contract';
import type { CutterBladeState } from '../../src/shared/cutting/test-cut';
import type { CutterMedia } from '../../src/shared/cutting/media-limits';
import type { CutterRow } from '../db/tables';

// mysql2 hands BIGINT columns back as strings once they pass 2^53; ours never do, but may arrive as strings.
const whole = (value: number | string): number => Number(value);

/** A stored cutter as the API shows it. */
export function toCutterView(row: CutterRow): CutterView {
  return {
    id: row.id,
    name: row.name,
    carriageWidthMm: row.carriage_width_mm,
    minMediaMm: row.min_media_mm,
    maxMediaMm: row.max_media_mm,
    bladeInstalledAt: row.blade_installed_at?.toISOString() ?? null,
    bladeDistanceMm: whole(row.blade_distance_mm),
    lastTestCutAt: row.last_test_cut_at?.toISOString() ?? null,
    sinceTestMm: Math.max(0, whole(row.blade_distance_mm) - whole(row.distance_at_last_test_mm)),
    testCutEveryMm: row.test_cut_every_mm,
    lastFilmTypeId: row.last_film_type_id,
  };
}

/** What the test-cut rule reads from a cutter. */
export function toBladeState(row: CutterRow, lastFilmWearClass: number | null): CutterBladeState {
  return {
    bladeInstalledAt: row.blade_installed_at,
    lastTestCutAt: row.last_test_cut_at,
    bladeDistanceMm: whole(row.blade_distance_mm),
    distanceAtLastTestMm: whole(row.distance_at_last_test_mm),
    testCutEveryMm: row.test_cut_every_mm,
    lastFilmWearClass,
  };
}

/** What the media-limit check reads from a cutter. */
export function toCutterMedia(row: CutterRow): CutterMedia {
  return { name: row.name, carriageWidthMm: row.carriage_width_mm, minMediaMm: row.min_media_mm, maxMediaMm: row.max_media_mm };
}
