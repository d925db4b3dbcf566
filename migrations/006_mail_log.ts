import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('mail_log', (t) => {
    t.increments('id');
    t.enum('kind', ['order_ready', 'film_low', 'shift_summary']).notNullable();
    t.string('to', 500).notNullable();
    t.string('subject', 200).notNullable();
    t.text('text').notNullable();
    t.text('html', 'mediumtext').notNullable();
    t.enum('status', ['queued', 'sent', 'failed']).notNullable().defaultTo('queued').index();
    t.tinyint('attempts').unsigned().notNullable().defaultTo(0);
    t.string('last_error', 500).nullable();
    t.string('message_id', 250).nullable();
    t.json('related').notNullable(); // e.g. {"orderId": 3} or {"rollId": 7}
    t.datetime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.datetime('sent_at', { precision: 3 }).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('mail_log');
}
