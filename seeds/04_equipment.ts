import type { Knex } from 'knex';

const MM_PER_INCH = 25.4;
const MM_PER_YARD = 914.4; // exact: 36 in x 25.4 mm
const DAY_MS = 24 * 60 * 60 * 1000;

const inches = (n: number): number => Math.round(n * MM_PER_INCH);
const yards = (n: number): number => Math.round(n * MM_PER_YARD);

// [label, film type, colour, width in, length yd, remaining yd, reorder yd, rack slot, days since received]
const ROLLS: [string, string, string, number, number, number, number, string, number][] = [
  ['R-101', 'Standard PU 90 µm', 'White', 15, 25, 9, 3, 'A1', 40],
  ['R-102', 'Standard PU 90 µm', 'Black', 20, 25, 25, 3, 'A2', 6],
  ['R-103', 'Standard PU 90 µm', 'Red', 12, 5, 1, 2, 'A3', 55],
  ['R-104', 'Glitter 200 µm', 'Gold glitter', 12, 10, 7, 2, 'B1', 30],
  ['R-105', 'Flock 450 µm', 'Navy flock', 15, 10, 10, 2, 'B2', 12],
  ['R-106', 'Low-temp PU 80 µm', 'White', 15, 10, 8, 2, 'B3', 21],
  ['R-107', 'Stretch PU 75 µm', 'White', 15, 25, 20, 3, 'A4', 18],
  ['R-108', 'Standard PU 90 µm', 'White', 20, 25, 25, 3, 'A5', 6],
];

/** Two presses, one cutter, the roll rack and six unpaired stations. */
export async function seed(knex: Knex): Promise<void> {
  const now = Date.now();
  const daysAgo = (days: number): Date => new Date(now - days * DAY_MS);

  await knex('presses').insert([
    {
      name: 'Clamshell 15 x 15',
      kind: 'manual',
      platen_width_mm: inches(15),
      platen_height_mm: inches(15),
      bore_mm: null,
      max_gauge_kpa: null,
      notes: 'Manual clamshell. Pressure set with the knob on top: light, medium, firm, heavy.',
    },
    {
      name: 'Air press 16 x 20',
      kind: 'air',
      platen_width_mm: inches(16),
      platen_height_mm: inches(20),
      bore_mm: (3 * MM_PER_INCH).toFixed(2),
      max_gauge_kpa: '689.48', // 100 psi
      notes: 'Pneumatic swing-away on the shop compressor. Gauge on the front panel reads psi.',
    },
  ]);

  const standardPu = await knex('film_types').where({ name: 'Standard PU 90 µm' }).first('id');
  await knex('cutters').insert({
    name: 'Cutter 24',
    carriage_width_mm: inches(24),
    min_media_mm: inches(12),
    max_media_mm: inches(20),
    blade_installed_at: daysAgo(10),
    blade_distance_mm: 180_000,
    last_test_cut_at: daysAgo(3),
    distance_at_last_test_mm: 132_000,
    last_film_type_id: standardPu?.id ?? null,
  });

  const films: { id: number; type: string; colour: string }[] = await knex('films')
    .join('film_types', 'film_types.id', 'films.film_type_id')
    .select('films.id', 'film_types.name as type', 'films.colour');
  const filmId = (type: string, colour: string): number => {
    const film = films.find((f) => f.type === type && f.colour === colour);
    if (!film) throw new Error(`No film ${type} ${colour}`);
    return film.id;
  };

  await knex('rolls').insert(
    ROLLS.map(([label, type, colour, widthIn, lengthYd, remainingYd, reorderYd, rack_slot, receivedDaysAgo]) => ({
      film_id: filmId(type, colour),
      label,
      width_mm: inches(widthIn),
      length_mm: yards(lengthYd),
      remaining_mm: yards(remainingYd),
      reorder_mm: yards(reorderYd),
      rack_slot,
      received_at: daysAgo(receivedDaysAgo),
    })),
  );

  const cutter = await knex('cutters').where({ name: 'Cutter 24' }).first('id');
  const manual = await knex('presses').where({ name: 'Clamshell 15 x 15' }).first('id');
  const air = await knex('presses').where({ name: 'Air press 16 x 20' }).first('id');
  await knex('stations').insert([
    { name: 'Cut 1', kind: 'cut', cutter_id: cutter!.id },
    { name: 'Weed 1', kind: 'weed' },
    { name: 'Weed 2', kind: 'weed' },
    { name: 'Press 1', kind: 'press', press_id: manual!.id },
    { name: 'Press 2', kind: 'press', press_id: air!.id },
    { name: 'Pack 1', kind: 'pack' },
  ]);
}
