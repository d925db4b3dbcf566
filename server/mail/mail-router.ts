import { Router } from 'express';
import { z } from 'zod';
import { MAIL_KINDS, MAIL_STATUSES } from '../../src/shared/mail-contract';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { idParams, validate } from '../http/validate';
import { MailLogService } from './mail-log-service';
import type { MailOutbox } from './mail-outbox';
import type { ShiftSummaryScheduler } from './shift-summary-scheduler';

// "?status=" from an empty filter means no filter.
const blankIsAbsent = (value: unknown) => (value === '' ? undefined : value);
const listQuery = z.object({
  status: z.preprocess(blankIsAbsent, z.enum(MAIL_STATUSES, { error: `Filter by status ${MAIL_STATUSES.join(', ')}, or leave it out.` }).optional()),
  kind: z.preprocess(blankIsAbsent, z.enum(MAIL_KINDS, { error: `Filter by kind ${MAIL_KINDS.join(', ')}, or leave it out.` }).optional()),
  page: z.preprocess(blankIsAbsent, z.coerce.number({ error: 'The page is a whole number from 1.' }).int('The page is a whole number from 1.').min(1, 'The page is a whole number from 1.').default(1)),
  pageSize: z.preprocess(
    blankIsAbsent,
    z.coerce.number({ error: 'The page size is a whole number from 1 to 100.' }).int('The page size is a whole number from 1 to 100.').min(1, 'The page size is at least 1.').max(100, 'The page size is at most 100.').default(25),
  ),
});

// The HTML part is the customer's message, not the app: it may style itself inline and nothing else,
// and only the app itself may frame it.
const MESSAGE_CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; sandbox; frame-ancestors 'self'";

/** /api/mail: the Mail outbox (owner, lead). */
export function mailRouter(db: Db, outbox: MailOutbox, shiftSummary: ShiftSummaryScheduler): Router {
  const router = Router();
  const log = new MailLogService(db);
  const office = allowRoles('owner', 'lead');

  router.get('/', office, async (req, res) => {
    res.json(await log.page(validate(listQuery, req.query, 'mail filter')));
  });

  router.post('/shift-summary', office, async (_req, res) => {
    res.status(201).json(await shiftSummary.sendNow());
  });

  router.get('/:id', office, async (req, res) => {
    const { id } = validate(idParams('message'), req.params, 'message address');
    res.json(await log.detail(id));
  });

  router.get('/:id/html', office, async (req, res) => {
    const { id } = validate(idParams('message'), req.params, 'message address');
    const html = await log.html(id);
    res.set({ 'Content-Security-Policy': MESSAGE_CSP, 'X-Content-Type-Options': 'nosniff', 'Cache-Control': 'no-store', 'Referrer-Policy': 'no-referrer' });
    res.type('text/html; charset=utf-8').send(html);
  });

  router.post('/:id/retry', office, async (req, res) => {
    const { id } = validate(idParams('message'), req.params, 'message address');
    res.json(await outbox.retry(id));
  });

  return router;
}
