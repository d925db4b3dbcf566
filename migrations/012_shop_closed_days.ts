import type { Knex } from 'knex';

// Dates the shop is closed on what would be a working day (bank holidays, a stocktake), as a JSON list
// of {date: 'YYYY-MM-DD', note} kept with the other settings: ETAs and the next shift's plan skip them.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_settings', (t) => {
    t.text('closed_days').notNullable();
  });
  await knex.raw("UPDATE shop_settings SET closed_days = '[]'");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_settings', (t) => {
    t.dropColumn('closed_days');
  });
}
