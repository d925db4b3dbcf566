import type { Knex } from 'knex';

const STAGES = ['cut', 'weed', 'press', 'pack'] as const;

// A standard rate for each stage of work instead of one for all: weeding a fine design is far slower
// than packing it, so an ETA before the floor has shown its own rates needs each stage's own number.
// Each stage starts from the shop's one rate.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_settings', (t) => {
    for (const stage of STAGES) t.smallint(`standard_${stage}_per_hour`).unsigned().notNullable().defaultTo(40);
  });
  await knex.raw(`UPDATE shop_settings SET ${STAGES.map((stage) => `standard_${stage}_per_hour = standard_pieces_per_hour`).join(', ')}`);
  await knex.schema.alterTable('shop_settings', (t) => {
    t.dropColumn('standard_pieces_per_hour');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_settings', (t) => {
    t.smallint('standard_pieces_per_hour').unsigned().notNullable().defaultTo(40);
  });
  // One rate for every stage: the slowest stage's, so no ETA gets earlier.
  await knex.raw('UPDATE shop_settings SET standard_pieces_per_hour = LEAST(standard_cut_per_hour, standard_weed_per_hour, standard_press_per_hour, standard_pack_per_hour)');
  await knex.schema.alterTable('shop_settings', (t) => {
    for (const stage of STAGES) t.dropColumn(`standard_${stage}_per_hour`);
  });
}
