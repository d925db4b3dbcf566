import express, { type RequestHandler } from 'express';
import helmet from 'helmet';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import { authRouter } from './auth/auth-router';
import { publicRoute } from './auth/guards';
import { loadPrincipal } from './auth/principal';
import { sessionMiddleware } from './auth/session-middleware';
import type { Env } from './config/env';
import type { Db } from './db/tables';
import { displaysRouter } from './displays/displays-router';
import { apiNotFound, errorHandler } from './http/error-handler';
import { originCheck } from './http/origin-check';
import { staticApp } from './http/static-app';
import { stationsRouter } from './stations/stations-router';

/** What the hub needs from outside to build its app. */
export interface AppDeps {
  db: Db;
  env: Env;
  sessionSecret: string;
  logger: Logger;
  browserDist: string;
}

/** The largest JSON body the API reads; a station's event batch fits many times over. */
export const JSON_BODY_LIMIT = '256kb';

/** Builds the hub's Express app (no listening): the API under /api and the built client. */
export function createApp({ db, env, sessionSecret, logger, browserDist }: AppDeps): { app: express.Express; session: RequestHandler } {
  const app = express();
  app.set('trust proxy', env.TRUST_PROXY ? 1 : false);
  app.disable('x-powered-by');

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          // Angular adds component styles as <style> elements; scripts stay strictly same-origin.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'media-src': ["'self'", 'blob:'],
          'worker-src': ["'self'"],
          'connect-src': ["'self'"],
          // Tablets reach the hub over plain HTTP on the shop's network; do not force HTTPS sub-requests.
          'upgrade-insecure-requests': null,
        },
      },
      strictTransportSecurity: env.TRUST_PROXY,
    }),
  );
  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => !req.url?.startsWith('/api') } }));

  const session = sessionMiddleware(db, env, sessionSecret);
  const api = express.Router();
  api.use(express.json({ limit: JSON_BODY_LIMIT, strict: true }));
  api.use(originCheck(env.ALLOWED_ORIGINS));
  api.use(session);
  api.use(loadPrincipal(db));

  api.get('/health', publicRoute('load balancers and the start script check the hub is up'), (_req, res) => {
    res.json({ ok: true });
  });
  api.use('/auth', authRouter(db, env));
  api.use('/stations', stationsRouter(db));
  api.use('/displays', displaysRouter(db));
  api.use(apiNotFound);

  app.use('/api', api);
  app.use(staticApp(browserDist));
  app.use(errorHandler);
  return { app, session };
}
