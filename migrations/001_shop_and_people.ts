import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('shop_settings', (t) => {
    t.tinyint('id').unsigned().primary(); // always 1: the shop's one row
    t.string('shop_name', 120).notNullable();
    t.string('address', 400).notNullable().defaultTo('');
    t.string('phone', 40).notNullable().defaultTo('');
    t.string('email', 254).notNullable().defaultTo('');
    t.enum('units', ['imperial', 'metric']).notNullable().defaultTo('imperial');
    t.string('time_zone', 64).notNullable().defaultTo('UTC');
    t.smallint('bag_max_pieces').unsigned().notNullable().defaultTo(24);
    t.time('shift_start').notNullable().defaultTo('07:00:00');
    t.time('shift_end').notNullable().defaultTo('15:30:00');
    t.smallint('standard_pieces_per_hour').unsigned().notNullable().defaultTo(40);
    t.smallint('heat_exposure_limit_s').unsigned().notNullable().defaultTo(45);
    t.datetime('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });

  await knex.schema.createTable('users', (t) => {
    t.increments('id');
    t.string('name', 120).notNullable();
    t.string('email', 254).nullable().unique();
    t.enum('role', ['owner', 'lead', 'operator']).notNullable();
    t.string('password_hash', 100).nullable();
    t.string('pin_hash', 100).nullable();
    t.boolean('active').notNullable().defaultTo(true);
    t.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.datetime('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });

  // express-session rows (connect-session-knex layout); named apart from any other "sessions".
  await knex.schema.createTable('web_sessions', (t) => {
    t.string('sid', 255).primary();
    t.json('sess').notNullable();
    t.datetime('expired').notNullable().index();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('web_sessions');
  await knex.schema.dropTable('users');
  await knex.schema.dropTable('shop_settings');
}
