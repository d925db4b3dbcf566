import type { Knex } from 'knex';

const placements = ['left_chest', 'full_front', 'full_back', 'sleeve', 'nape', 'custom'];
const stages = ['queued', 'cut', 'weeded', 'pressed', 'packed'];

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('customers', (t) => {
    t.increments('id');
    t.string('name', 160).notNullable();
    t.string('contact_name', 120).notNullable().defaultTo('');
    t.string('email', 254).notNullable().defaultTo('');
    t.string('phone', 40).notNullable().defaultTo('');
    t.text('notes').notNullable();
    t.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });

  await knex.schema.createTable('orders', (t) => {
    t.increments('id');
    t.string('code', 20).notNullable().unique();
    t.integer('customer_id').unsigned().notNullable().references('customers.id');
    t.datetime('due_at', { precision: 3 }).notNullable().index();
    t.enum('status', ['open', 'ready', 'collected', 'cancelled']).notNullable().defaultTo('open');
    t.text('notes').notNullable();
    t.integer('created_by').unsigned().nullable().references('users.id');
    t.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.datetime('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.datetime('ready_at', { precision: 3 }).nullable();
  });

  await knex.schema.createTable('jobs', (t) => {
    t.increments('id');
    t.integer('order_id').unsigned().notNullable().references('orders.id').onDelete('CASCADE');
    t.string('name', 160).notNullable();
    t.string('design_file', 120).nullable(); // random name under var/uploads
    t.string('design_mime', 40).nullable();
    t.integer('design_width_mm').unsigned().notNullable();
    t.integer('design_height_mm').unsigned().notNullable();
    t.enum('placement', placements).notNullable();
    t.integer('offset_x_mm').nullable();
    t.integer('offset_y_mm').nullable();
    t.string('garment', 120).notNullable();
    t.integer('fabric_id').unsigned().notNullable().references('fabrics.id');
    t.json('quantities').notNullable(); // {"S": 4, "M": 10, ...}
    t.boolean('personalised').notNullable().defaultTo(false);
    t.boolean('rotation_allowed').notNullable().defaultTo(true);
    t.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });

  // Layers in pressing order: position 1 goes on first and is tacked; the last gets the full dwell.
  await knex.schema.createTable('job_layers', (t) => {
    t.increments('id');
    t.integer('job_id').unsigned().notNullable().references('jobs.id').onDelete('CASCADE');
    t.tinyint('position').unsigned().notNullable();
    t.integer('film_id').unsigned().notNullable().references('films.id');
    t.unique(['job_id', 'position']);
  });

  await knex.schema.createTable('bags', (t) => {
    t.increments('id');
    t.integer('order_id').unsigned().notNullable().references('orders.id').onDelete('CASCADE');
    t.integer('job_id').unsigned().notNullable().references('jobs.id').onDelete('CASCADE');
    t.string('code', 20).notNullable().unique(); // printed big on the label, e.g. 1042-B
    t.string('token', 43).notNullable().unique(); // base64url of 32 random bytes, held in the QR code
    t.enum('stage', stages).notNullable().defaultTo('queued').index();
    t.json('sizes').notNullable();
    t.smallint('pieces').unsigned().notNullable();
    t.smallint('qty_cut').unsigned().notNullable().defaultTo(0);
    t.smallint('qty_weeded').unsigned().notNullable().defaultTo(0);
    t.smallint('qty_pressed').unsigned().notNullable().defaultTo(0);
    t.smallint('qty_packed').unsigned().notNullable().defaultTo(0);
    t.smallint('qty_spoiled').unsigned().notNullable().defaultTo(0);
    t.smallint('remake_count').unsigned().notNullable().defaultTo(0);
    t.boolean('over_count').notNullable().defaultTo(false);
    t.bigInteger('version').unsigned().notNullable().defaultTo(1).index(); // bumps on every change, for station sync
    t.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.datetime('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });

  await knex.schema.createTable('roster_lines', (t) => {
    t.increments('id');
    t.integer('job_id').unsigned().notNullable().references('jobs.id').onDelete('CASCADE');
    t.integer('bag_id').unsigned().nullable().references('bags.id').onDelete('SET NULL');
    t.smallint('position').unsigned().notNullable();
    t.string('name', 40).notNullable();
    t.string('number', 2).notNullable().defaultTo(''); // text: "00" and "0" are different numbers on a jersey
    t.string('size', 8).notNullable();
    t.string('extra_text', 40).notNullable().defaultTo('');
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['roster_lines', 'bags', 'job_layers', 'jobs', 'orders', 'customers']) {
    await knex.schema.dropTable(table);
  }
}
