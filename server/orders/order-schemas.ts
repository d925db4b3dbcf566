import { z } from 'zod';

const MAX_PAST_DUE_MS = 24 * 60 * 60 * 1000;

/** A due date: an ISO date-time, not more than a day in the past (a back-dated order is almost always a typo). */
export const dueAtSchema = z
  .string({ error: 'The due date is missing.' })
  .refine((text) => /^\d{4}-\d{2}-\d{2}/.test(text) && !Number.isNaN(Date.parse(text)), {
    message: 'The due date is not a valid date. Use a date and time like 2026-05-14T16:00:00Z.',
  })
  .refine((text) => Date.parse(text) >= Date.now() - MAX_PAST_DUE_MS, {
    message: 'The due date is more than a day in the past. Pick today or a later day.',
  });

const trimmed = (max: number, what: string) => z.string().trim().max(max, `${what} is at most ${max} characters.`);

/** A customer made inline with an order. */
export const newCustomerSchema = z.object({
  name: trimmed(160, 'A customer name').min(1, 'The customer needs a name.'),
  contactName: trimmed(120, 'A contact name').default(''),
  email: z.union([z.literal(''), z.email('The e-mail address does not look right. Check it or leave it empty.').max(254)]).default(''),
  phone: trimmed(40, 'A phone number').default(''),
});

/** POST /api/orders */
export const orderCreateSchema = z
  .object({
    customerId: z.number().int().positive().optional(),
    newCustomer: newCustomerSchema.optional(),
    dueAt: dueAtSchema,
    notes: trimmed(4000, 'The notes').default(''),
  })
  .refine((body) => (body.customerId === undefined) !== (body.newCustomer === undefined), {
    message: 'Pick an existing customer or enter a new one (one of the two).',
    path: ['customerId'],
  });

/** PATCH /api/orders/:id */
export const orderUpdateSchema = z.object({
  customerId: z.number().int().positive().optional(),
  dueAt: dueAtSchema.optional(),
  notes: trimmed(4000, 'The notes').optional(),
});

/** GET /api/orders query */
export const orderPageSchema = z.object({
  q: z.string().trim().max(100, 'A search is at most 100 characters.').default(''),
  status: z.enum(['open', 'ready', 'collected', 'cancelled']).optional(),
  sort: z.enum(['dueAt', 'code', 'customer', 'pieces']).default('dueAt'),
  dir: z.enum(['asc', 'desc']).default('asc'),
  page: z.coerce.number().int().min(1, 'The page is 1 or more.').default(1),
  pageSize: z.coerce.number().int().min(1).max(100, 'A page holds at most 100 orders.').default(20),
});
