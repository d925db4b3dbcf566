import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // Every change to a roll's remaining length, so the Roll rack can show where the film went.
  await knex.schema.createTable('roll_movements', (t) => {
    t.increments('id');
    t.integer('roll_id').unsigned().notNullable().references('rolls.id').onDelete('CASCADE');
    t.enum('kind', ['received', 'cut', 'measure']).notNullable();
    t.integer('change_mm').notNullable(); // negative when film left the roll
    t.integer('remaining_mm').unsigned().notNullable(); // after the change
    t.integer('cut_length_mm').unsigned().nullable();
    t.integer('test_cut_mm').unsigned().nullable();
    t.integer('cutter_id').unsigned().nullable().references('cutters.id');
    t.integer('user_id').unsigned().nullable().references('users.id');
    t.json('bag_ids').nullable();
    t.string('note', 400).notNullable().defaultTo('');
    t.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['roll_id', 'created_at']);
  });

  // Which layer films of a bag are cut: a two-layer bag is cut once per film before it counts as cut.
  await knex.schema.createTable('bag_layer_cuts', (t) => {
    t.increments('id');
    t.integer('bag_id').unsigned().notNullable().references('bags.id').onDelete('CASCADE');
    t.integer('film_id').unsigned().notNullable().references('films.id');
    t.integer('roll_movement_id').unsigned().notNullable().references('roll_movements.id').onDelete('CASCADE');
    t.datetime('cut_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.unique(['bag_id', 'film_id']);
  });

  // The force that last cut and weeded clean on a cutter for a film type; the film type's preset stays the shop's.
  await knex.schema.createTable('cutter_film_forces', (t) => {
    t.integer('cutter_id').unsigned().notNullable().references('cutters.id').onDelete('CASCADE');
    t.integer('film_type_id').unsigned().notNullable().references('film_types.id').onDelete('CASCADE');
    t.smallint('force_g').unsigned().notNullable();
    t.datetime('tested_at', { precision: 3 }).notNullable();
    t.primary(['cutter_id', 'film_type_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('cutter_film_forces');
  await knex.schema.dropTable('bag_layer_cuts');
  await knex.schema.dropTable('roll_movements');
}
