import type { Knex } from 'knex';

// The days of the week the shop's shift runs, as ISO 8601 weekday numbers (1 = Monday): ETAs and the
// next shift's plan skip the others. An existing shop keeps working every day until the owner says otherwise.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_settings', (t) => {
    t.string('working_days', 13).notNullable().defaultTo('1,2,3,4,5,6,7');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_settings', (t) => {
    t.dropColumn('working_days');
  });
}
