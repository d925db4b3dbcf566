import type { RequestHandler } from 'express';
import { HttpError } from './http-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests sent from another site's page. Browsers send Origin (or
 * Sec-Fetch-Site) on such requests; tools without either (curl, tests) carry no ambient cookie risk.
 */
export function originCheck(allowedOrigins: readonly string[]): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get('origin');
    const fetchSite = req.get('sec-fetch-site');
    if (origin) {
      const own = `${req.protocol}://${req.get('host')}`;
      if (origin === own || allowedOrigins.includes(origin)) return next();
      throw new HttpError(403, `Requests from ${origin} are not accepted. Open Dwell from the hub's own address.`);
    }
    if (fetchSite && fetchSite !== 'same-origin' && fetchSite !== 'none') {
      throw new HttpError(403, 'Requests from another site are not accepted. Open Dwell from the hub\'s own address.');
    }
    next();
  };
}
