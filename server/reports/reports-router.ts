import { Router } from 'express';
import { z } from 'zod';
import { isRealDay } from '../../src/shared/floor/shift-window';
import { REPORT_MAX_DAYS } from '../../src/shared/reports-contract';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { validate } from '../http/validate';
import { reportCsv } from './report-csv';
import { ReportsService } from './reports-service';

const day = (which: 'first' | 'last', name: 'from' | 'to') =>
  z
    .string({ error: `Give the ${which} day of the report as ${name}=YYYY-MM-DD, e.g. 2026-11-01.` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, `Write the ${which} day as YYYY-MM-DD, e.g. 2026-11-01.`)
    .refine(isRealDay, `The ${which} day is not on the calendar: check its month and day.`);

const rangeQuery = z
  .object({ from: day('first', 'from'), to: day('last', 'to') })
  .superRefine(({ from, to }, ctx) => {
    if (!isRealDay(from) || !isRealDay(to)) return; // Already told which day to fix.
    if (from > to) {
      ctx.addIssue({ code: 'custom', path: ['to'], message: `The last day (${to}) is before the first day (${from}): swap them.` });
      return;
    }
    // Date-only ISO strings parse as UTC midnight, so the difference is whole days whatever the shop's zone.
    const count = (Date.parse(to) - Date.parse(from)) / 86_400_000 + 1;
    if (count > REPORT_MAX_DAYS) {
      ctx.addIssue({ code: 'custom', path: ['from'], message: `A report covers at most ${REPORT_MAX_DAYS} days and this range has ${count}: move the first day later or the last day earlier.` });
    }
  });

/** /api/reports: the floor report as JSON and as a CSV download. */
export function reportsRouter(db: Db): Router {
  const router = Router();
  const reports = new ReportsService(db);
  const leads = allowRoles('owner', 'lead');

  router.get('/floor', leads, async (req, res) => {
    const { from, to } = validate(rangeQuery, req.query, 'report range');
    res.json(await reports.floor(from, to));
  });

  router.get('/floor.csv', leads, async (req, res) => {
    const { from, to } = validate(rangeQuery, req.query, 'report range');
    const report = await reports.floor(from, to);
    res.attachment(`dwell-floor-${from}-to-${to}.csv`);
    res.type('text/csv; charset=utf-8');
    res.send(reportCsv(report.rows));
  });

  return router;
}
