import { z } from 'zod';

/** POST /api/auth/login */
export const loginBody = z.object({
  email: z.string().trim().min(3, 'Enter your e-mail address.').max(254),
  password: z.string().min(1, 'Enter your password.').max(200),
});

const deviceToken = z
  .string()
  .min(20, 'This tablet has no valid device token: ask a lead to pair it.')
  .max(100)
  .regex(/^[A-Za-z0-9_-]+$/, 'A device token holds only letters, digits, - and _.');

/** POST /api/auth/device and /api/auth/display */
export const deviceBody = z.object({ deviceToken });

/** POST /api/auth/pin */
export const pinBody = z.object({
  deviceToken,
  pin: z.string().regex(/^\d{4,6}$/, 'A PIN is 4 to 6 digits.'),
  userId: z.number().int().positive().optional(),
});
