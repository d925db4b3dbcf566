import { z } from 'zod';
import { badRequest } from './http-error';

/** Parses request input with a zod schema; a failure becomes a 400 naming each bad field. */
export function validate<Schema extends z.ZodType>(schema: Schema, input: unknown, what = 'request'): z.infer<Schema> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const details = parsed.error.issues.map((issue) => ({
    path: issue.path.join('.'),
    message: issue.message,
  }));
  const first = details[0];
  const where = first?.path ? ` (${first.path}: ${first.message})` : first ? ` (${first.message})` : '';
  throw badRequest(`Some of the ${what} is missing or not valid${where}. Check the fields and send it again.`, details);
}

/** Route parameters `{ id }`, where id must be a positive whole number. */
export function idParams(thing: string) {
  const message = `A ${thing} id is a whole number.`;
  return z.object({ id: z.coerce.number({ error: message }).int(message).positive(message) });
}
