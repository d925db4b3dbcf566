import { z } from 'zod';

const id = (what: string) => z.number({ error: `Choose the ${what}.` }).int(`A ${what} id is a whole number.`).positive(`Choose the ${what}.`);
const spacingMm = (what: string) => z.number({ error: `${what} is a number of millimetres.` }).min(0, `${what} cannot be negative.`).max(100, `${what} is at most 100 mm.`);
const spacing = (what: string) => spacingMm(what).optional();
const bagIds = z
  .array(id('bag'), { error: 'Pick at least one bag.' })
  .min(1, 'Pick at least one bag.')
  .max(200, 'Plan at most 200 bags at once.')
  .refine((ids) => new Set(ids).size === ids.length, 'Each bag is picked once.');

/** POST /api/cut-plans/preview */
export const previewBody = z.object({
  bagIds,
  filmId: id('film'),
  rollId: id('roll').optional(),
  cutterId: id('cutter'),
  gapMm: spacing('The gap'),
  edgeMarginMm: spacing('The edge margin'),
  weedBorderMm: spacing('The weeding border'),
});

/** GET /api/cut-plans/layout.svg: the same fields as the preview, in the query (bagIds comma-separated). */
export const layoutQuery = z.object({
  bagIds: z
    .string({ error: 'Pick at least one bag.' })
    .max(2000)
    .transform((text) => text.split(',').filter(Boolean).map(Number))
    .pipe(bagIds),
  filmId: z.coerce.number().pipe(id('film')),
  cutterId: z.coerce.number().pipe(id('cutter')),
  rollId: z.coerce.number().pipe(id('roll')).optional(),
  gapMm: z.coerce.number().pipe(spacingMm('The gap')).optional(),
  edgeMarginMm: z.coerce.number().pipe(spacingMm('The edge margin')).optional(),
  weedBorderMm: z.coerce.number().pipe(spacingMm('The weeding border')).optional(),
});

/** POST /api/cut-plans/confirm */
export const confirmBody = z.object({
  bagIds,
  filmId: id('film'),
  rollId: id('roll'),
  cutterId: id('cutter'),
  lengthMm: z.number({ error: 'The length cut is a number of millimetres.' }).positive('The length cut is more than 0 mm.').max(100_000, 'The length cut is at most 100 m.'),
  testCutMm: z.number({ error: 'The test cut length is a number of millimetres.' }).min(0, 'The test cut length cannot be negative.').max(2000, 'A test cut takes at most 2000 mm.').optional(),
});
