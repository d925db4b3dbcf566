import type { Knex } from 'knex';

// When the outbox may next try a message: now for a new one, later after a failure, null when it waits for a lead.
// Claiming a message pushes it ahead, so two senders never send the same row at once.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('mail_log', (t) => {
    t.datetime('next_attempt_at', { precision: 3 }).nullable();
    t.index(['status', 'next_attempt_at'], 'mail_log_due');
  });
  await knex('mail_log').whereIn('status', ['queued', 'failed']).update({ next_attempt_at: knex.fn.now(3) as never });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('mail_log', (t) => {
    t.dropIndex(['status', 'next_attempt_at'], 'mail_log_due');
    t.dropColumn('next_attempt_at');
  });
}
