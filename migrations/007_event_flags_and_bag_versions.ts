import type { Knex } from 'knex';

// A bag's version is microseconds since the epoch on the database clock, so a bag made by any code
// path (a split, a seed) starts with a current version and stations pulling "since" see it.
const NOW_MICROS = 'CAST(UNIX_TIMESTAMP(NOW(6)) * 1000000 AS UNSIGNED)';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('events', (t) => {
    // Why the hub flagged this event as an over-count (null when it was not), for the board and the lead.
    t.string('over_count_reason', 400).nullable();
  });
  await knex.raw(`ALTER TABLE bags MODIFY version BIGINT UNSIGNED NOT NULL DEFAULT (${NOW_MICROS})`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('ALTER TABLE bags MODIFY version BIGINT UNSIGNED NOT NULL DEFAULT 1');
  await knex.schema.alterTable('events', (t) => {
    t.dropColumn('over_count_reason');
  });
}
