import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('stations', (t) => {
    t.increments('id');
    t.string('name', 80).notNullable().unique();
    t.enum('kind', ['cut', 'weed', 'press', 'pack']).notNullable();
    t.integer('press_id').unsigned().nullable().references('presses.id');
    t.integer('cutter_id').unsigned().nullable().references('cutters.id');
    // Only a SHA-256 of the tablet's device token is kept: the token itself has 256 random bits.
    t.string('device_token_hash', 64).nullable().unique();
    t.datetime('paired_at', { precision: 3 }).nullable();
    t.integer('paired_by').unsigned().nullable().references('users.id');
    t.datetime('last_seen_at', { precision: 3 }).nullable();
    t.datetime('last_sync_at', { precision: 3 }).nullable();
  });

  await knex.schema.createTable('displays', (t) => {
    t.increments('id');
    t.string('name', 80).notNullable();
    t.string('token_hash', 64).notNullable().unique();
    t.integer('created_by').unsigned().nullable().references('users.id');
    t.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.datetime('revoked_at', { precision: 3 }).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('displays');
  await knex.schema.dropTable('stations');
}
