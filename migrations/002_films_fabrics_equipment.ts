import type { Knex } from 'knex';

const pressureClasses = ['light', 'medium', 'firm', 'heavy'];
const peels = ['hot', 'warm', 'cold'];

export async function up(knex: Knex): Promise<void> {
  // A film type is a product line with one cut preset and one set of press recipes, sold in colours.
  await knex.schema.createTable('film_types', (t) => {
    t.increments('id');
    t.string('name', 120).notNullable().unique();
    t.string('supplier', 120).notNullable().defaultTo('');
    t.smallint('thickness_um').unsigned().notNullable();
    t.tinyint('wear_class').unsigned().notNullable(); // 1 thin smooth .. 4 abrasive
    t.smallint('cut_force_g').unsigned().notNullable();
    t.smallint('cut_speed_mm_s').unsigned().notNullable();
    t.tinyint('blade_angle_deg').unsigned().notNullable().defaultTo(45);
    t.integer('low_temp_film_type_id').unsigned().nullable().references('film_types.id');
    t.text('notes').notNullable();
  });

  await knex.schema.createTable('films', (t) => {
    t.increments('id');
    t.integer('film_type_id').unsigned().notNullable().references('film_types.id');
    t.string('colour', 60).notNullable();
    t.string('colour_hex', 7).notNullable(); // swatch on screen only
    t.unique(['film_type_id', 'colour']);
  });

  await knex.schema.createTable('fabrics', (t) => {
    t.increments('id');
    t.string('name', 120).notNullable().unique();
    t.smallint('max_temp_c').unsigned().notNullable();
    t.text('notes').notNullable();
  });

  await knex.schema.createTable('recipes', (t) => {
    t.increments('id');
    t.integer('film_type_id').unsigned().notNullable().references('film_types.id');
    t.integer('fabric_id').unsigned().notNullable().references('fabrics.id');
    t.smallint('temp_c').unsigned().notNullable();
    t.smallint('dwell_s').unsigned().notNullable();
    t.enum('pressure_class', pressureClasses).notNullable();
    t.enum('peel', peels).notNullable();
    t.smallint('pre_press_s').unsigned().notNullable().defaultTo(0);
    t.smallint('tack_s').unsigned().notNullable().defaultTo(0);
    t.smallint('second_press_s').unsigned().nullable();
    t.text('notes').notNullable();
    t.string('source', 240).notNullable();
    t.datetime('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.unique(['film_type_id', 'fabric_id']);
  });

  await knex.schema.createTable('recipe_revisions', (t) => {
    t.increments('id');
    t.integer('recipe_id').unsigned().notNullable().references('recipes.id').onDelete('CASCADE');
    t.integer('changed_by').unsigned().nullable().references('users.id');
    t.datetime('changed_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.json('before').nullable();
    t.json('after').notNullable();
  });

  await knex.schema.createTable('presses', (t) => {
    t.increments('id');
    t.string('name', 120).notNullable().unique();
    t.enum('kind', ['manual', 'air']).notNullable();
    t.smallint('platen_width_mm').unsigned().notNullable();
    t.smallint('platen_height_mm').unsigned().notNullable();
    t.decimal('bore_mm', 6, 2).nullable(); // air presses only
    t.decimal('max_gauge_kpa', 7, 2).nullable();
    t.text('notes').notNullable();
  });

  await knex.schema.createTable('cutters', (t) => {
    t.increments('id');
    t.string('name', 120).notNullable().unique();
    t.smallint('carriage_width_mm').unsigned().notNullable();
    t.smallint('min_media_mm').unsigned().notNullable();
    t.smallint('max_media_mm').unsigned().notNullable();
    t.datetime('blade_installed_at', { precision: 3 }).nullable();
    t.bigInteger('blade_distance_mm').unsigned().notNullable().defaultTo(0);
    t.datetime('last_test_cut_at', { precision: 3 }).nullable();
    t.bigInteger('distance_at_last_test_mm').unsigned().notNullable().defaultTo(0);
    t.integer('last_film_type_id').unsigned().nullable().references('film_types.id');
    t.integer('test_cut_every_mm').unsigned().notNullable().defaultTo(500000);
  });

  await knex.schema.createTable('rolls', (t) => {
    t.increments('id');
    t.integer('film_id').unsigned().notNullable().references('films.id');
    t.string('label', 40).notNullable().unique(); // written on the core, e.g. R-014
    t.smallint('width_mm').unsigned().notNullable();
    t.integer('length_mm').unsigned().notNullable();
    t.integer('remaining_mm').unsigned().notNullable();
    t.integer('reorder_mm').unsigned().notNullable();
    t.string('rack_slot', 20).notNullable().defaultTo('');
    t.datetime('received_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.datetime('low_notified_at', { precision: 3 }).nullable();
    t.datetime('emptied_at', { precision: 3 }).nullable();
    t.index(['film_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['rolls', 'cutters', 'presses', 'recipe_revisions', 'recipes', 'fabrics', 'films']) {
    await knex.schema.dropTable(table);
  }
  await knex.schema.dropTable('film_types');
}
