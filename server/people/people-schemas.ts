import { z } from 'zod';

const name = z.string().trim().min(1, 'Enter the person\'s name.').max(120);
const email = z.email('Enter an e-mail address like name@shop.example.').max(254);
const password = z.string().min(10, 'A password needs at least 10 characters.').max(200);
/** A PIN is typed on a station tablet: 4 to 6 digits. */
export const pin = z.string().regex(/^\d{4,6}$/, 'A PIN is 4 to 6 digits.');

/** POST /api/people: owners and leads sign in by e-mail and password, operators by PIN. */
export const personCreate = z.discriminatedUnion('role', [
  z.object({ role: z.literal('operator'), name, pin }),
  z.object({ role: z.enum(['owner', 'lead']), name, email, password }),
]);

/** PATCH /api/people/:id */
export const personUpdate = z
  .object({ name, email, role: z.enum(['owner', 'lead', 'operator']), active: z.boolean() })
  .partial()
  .refine((body) => Object.keys(body).length > 0, 'Send at least one of name, email, role or active.');

/** POST /api/people/:id/pin */
export const pinReset = z.object({ pin });

/** POST /api/people/:id/password */
export const passwordReset = z.object({ password });
