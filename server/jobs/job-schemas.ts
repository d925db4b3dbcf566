import { z } from 'zod';
import { PLACEMENTS, SIZES } from '../../src/shared/intake-contract';
import { MAX_ROSTER_ROWS } from '../../src/shared/intake/roster-csv';
import { DESIGN_FILE_PATTERN } from '../designs/design-store';

const mm = (what: string, max: number) => z.number({ error: `${what} is a number of millimetres.` }).int(`${what} is whole millimetres.`).min(1).max(max);

/** Pieces per size: known sizes only, whole numbers. */
export const quantitiesSchema = z.partialRecord(z.enum(SIZES, { error: `A size is one of ${SIZES.join(', ')}.` }), z.number().int().min(0).max(10000));

/** One roster line as the job form sends it; the shared roster rules check it afterwards. */
export const rosterLineSchema = z.object({
  name: z.string().max(200),
  number: z.string().max(10),
  size: z.string().max(20),
  extraText: z.string().max(200).default(''),
});

/** POST /api/orders/:id/jobs */
export const jobCreateSchema = z.object({
  name: z.string().trim().min(1, 'The job needs a name.').max(160),
  designFile: z.string().regex(DESIGN_FILE_PATTERN, 'Upload the design first and send the file name the hub gave back.').optional(),
  designWidthMm: mm('The design width', 2000),
  designHeightMm: mm('The design height', 2000),
  placement: z.enum(PLACEMENTS),
  offsetXMm: z.number().int().min(-1000).max(1000).optional(),
  offsetYMm: z.number().int().min(-1000).max(1000).optional(),
  garment: z.string().trim().min(1, 'Say what garment this is (e.g. cotton tee, navy).').max(120),
  fabricId: z.number().int().positive(),
  layers: z.array(z.number().int().positive()).min(1, 'A job needs at least one film layer.').max(4, 'A job has at most 4 film layers.'),
  quantities: quantitiesSchema.optional(),
  rosterLines: z.array(rosterLineSchema).max(MAX_ROSTER_ROWS, `A roster holds at most ${MAX_ROSTER_ROWS} lines.`).optional(),
  /** Letter height for the roster's names; when given, names are checked against the design width. */
  letterHeightMm: z.number().positive().max(500).optional(),
  rotationAllowed: z.boolean().default(true),
});
export type JobCreateInput = z.infer<typeof jobCreateSchema>;
