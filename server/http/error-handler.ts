import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError, notFound } from './http-error';

/** JSON 404 for any /api path no router answered. */
export const apiNotFound: RequestHandler = (req) => {
  throw notFound(`There is no ${req.method} ${req.originalUrl.split('?')[0]} in the Dwell API.`);
};

interface BodyParserError extends Error {
  type?: string;
  status?: number;
  limit?: number;
}

/** Body-parser failures, translated into sentences. */
function fromBodyParser(err: BodyParserError): HttpError | undefined {
  switch (err.type) {
    case 'entity.parse.failed':
      return new HttpError(400, 'The request body is not valid JSON. Check for a missing quote, comma or bracket.');
    case 'entity.too.large':
      return new HttpError(413, `The request body is larger than the hub accepts (${Math.round((err.limit ?? 0) / 1024)} kB). Send less at once.`);
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return new HttpError(415, 'The request body must be UTF-8 JSON.');
    default:
      return undefined;
  }
}

/** The one place errors become responses: a status, a sentence, never a stack trace. */
export const errorHandler: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  const known = err instanceof HttpError ? err : fromBodyParser(err as BodyParserError);
  if (known) {
    res.status(known.status).json(known.details ? { error: known.message, details: known.details } : { error: known.message });
    return;
  }
  req.log?.error({ err }, 'unhandled error');
  res.status(500).json({ error: 'Something went wrong on the hub. Try again; if it keeps happening, tell the owner.' });
};
