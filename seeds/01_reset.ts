import type { Knex } from 'knex';

// Children before parents, so every foreign key is gone before the row it points at.
const TABLES_CHILD_FIRST = [
  'spoils',
  'photos',
  'bag_layer_cuts',
  'roll_movements',
  'cutter_film_forces',
  'events',
  'mail_log',
  'roster_lines',
  'bags',
  'job_layers',
  'jobs',
  'orders',
  'customers',
  'displays',
  'stations',
  'rolls',
  'cutters',
  'presses',
  'recipe_revisions',
  'recipes',
  'films',
  'film_types',
  'fabrics',
  'spoil_reasons',
  'web_sessions',
  'users',
  'shop_settings',
] as const;

/** Empties every table the demo seeds fill, so the seeds after it can run again and again. */
export async function seed(knex: Knex): Promise<void> {
  // A film type can point at its low-temperature sibling: break that link before deleting the types.
  await knex('film_types').update({ low_temp_film_type_id: null });
  for (const table of TABLES_CHILD_FIRST) {
    await knex(table).del();
  }
}
