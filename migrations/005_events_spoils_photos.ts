import type { Knex } from 'knex';

const eventKinds = ['scan', 'test_cut', 'cut_done', 'weed_done', 'press_done', 'spoil', 'pack_done'];
const stages = ['cut', 'weed', 'press', 'pack'];

export async function up(knex: Knex): Promise<void> {
  // The client's UUID is the key, so a replayed event is recognised and not counted twice.
  await knex.schema.createTable('events', (t) => {
    t.uuid('id').primary();
    // Arrival order at the hub. Knex's bigIncrements without a primary key drops AUTO_INCREMENT on MariaDB.
    t.specificType('seq', 'BIGINT UNSIGNED NOT NULL AUTO_INCREMENT UNIQUE');
    t.integer('bag_id').unsigned().nullable().references('bags.id');
    t.integer('station_id').unsigned().nullable().references('stations.id');
    t.integer('user_id').unsigned().nullable().references('users.id');
    t.enum('kind', eventKinds).notNullable();
    t.smallint('quantity').unsigned().notNullable().defaultTo(0);
    t.datetime('client_at', { precision: 3 }).notNullable();
    t.datetime('server_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.json('payload').notNullable();
    t.index(['bag_id']);
    t.index(['station_id', 'server_at']);
    t.index(['kind', 'server_at']);
  });

  await knex.schema.createTable('spoil_reasons', (t) => {
    t.increments('id');
    t.string('label', 80).notNullable().unique();
    t.smallint('position').unsigned().notNullable().defaultTo(0);
    t.boolean('active').notNullable().defaultTo(true);
  });

  await knex.schema.createTable('spoils', (t) => {
    t.increments('id');
    t.uuid('event_id').notNullable().unique().references('events.id');
    t.integer('bag_id').unsigned().notNullable().references('bags.id');
    t.enum('stage', stages).notNullable();
    t.integer('reason_id').unsigned().notNullable().references('spoil_reasons.id');
    t.smallint('quantity').unsigned().notNullable();
    t.text('note').notNullable();
    t.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });

  await knex.schema.createTable('photos', (t) => {
    t.increments('id');
    t.uuid('event_id').notNullable().unique().references('events.id');
    t.string('file', 120).notNullable();
    t.string('thumb_file', 120).notNullable();
    t.string('mime', 40).notNullable();
    t.integer('bytes').unsigned().notNullable();
    t.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['photos', 'spoils', 'spoil_reasons', 'events']) {
    await knex.schema.dropTable(table);
  }
}
