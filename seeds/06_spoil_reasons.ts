import type { Knex } from 'knex';

const REASONS = [
  'Film lifted after peel',
  'Placed crooked',
  'Wrong placement on garment',
  'Scorch or shine mark',
  'Torn while weeding',
  'Wrong size pressed',
  'Cut incomplete',
  'Garment flaw',
  'Other (say in the note)',
];

/** The starting list of spoil reasons; the shop edits it from then on. */
export async function seed(knex: Knex): Promise<void> {
  await knex('spoil_reasons').insert(REASONS.map((label, i) => ({ label, position: (i + 1) * 10, active: true })));
}
