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
import { peopleRouter } from './people/people-router';
import { apiNotFound, errorHandler } from './http/error-handler';
import { originCheck } from './http/origin-check';
import { pressCardsRouter } from './press/press-cards-router';
import { pressesRouter } from './press/presses-router';
import { recipesRouter } from './press/recipes-router';
import { staticApp } from './http/static-app';
import { stationsRouter } from './stations/stations-router';
import { bagsRouter } from './bags/bags-router';
import { customersRouter } from './customers/customers-router';
import { designsRouter } from './designs/designs-router';
import { jobsRouter } from './jobs/jobs-router';
import { labelsRouter } from './labels/labels-router';
import { materialsRouter } from './materials/materials-router';
import { ordersRouter } from './orders/orders-router';
import { cutPlansRouter } from './cutting/cut-plans-router';
import { cuttersRouter } from './cutters/cutters-router';
import { rollsRouter } from './rolls/rolls-router';
import { eventsRouter } from './events/events-router';
import { FloorBroadcast } from './events/floor-broadcast';
import { photosRouter } from './spoils/photos-router';
import { spoilReasonsRouter } from './spoils/spoil-reasons-router';
import { ticketsRouter } from './tickets/tickets-router';
import { boardRouter } from './board/board-router';
import { BoardService } from './board/board-service';
import type { EventFollowers } from './events/event-followers';
import { MailOutbox } from './mail/mail-outbox';
import { mailRouter } from './mail/mail-router';
import { ShiftSummaryScheduler } from './mail/shift-summary-scheduler';
import { OrderReadiness } from './orders/order-readiness';
import { RollLowNotice } from './rolls/roll-low-notice';
import { reportsRouter } from './reports/reports-router';
import { shopRouter } from './shop/shop-router';

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

/** What createApp builds besides the app: the socket server's event followers and the mail, which startHub starts and stops. */
export interface AppParts {
  app: express.Express;
  session: RequestHandler;
  floor: FloorBroadcast;
  followers: EventFollowers;
  mail: MailOutbox;
  shiftSummary: ShiftSummaryScheduler;
}

/** Builds the hub's Express app (no listening): the API under /api and the built client. */
export function createApp({ db, env, sessionSecret, logger, browserDist }: AppDeps): AppParts {
  const app = express();
  const floor = new FloorBroadcast();
  // Mail waits in the outbox until startHub starts it; a bare app (as in supertest) only queues.
  const mail = new MailOutbox(db, { smtpUrl: env.SMTP_URL, mailFrom: env.MAIL_FROM, logger });
  const followers: EventFollowers = { floor, readiness: new OrderReadiness(db, mail, logger) };
  const board = new BoardService(db);
  const shiftSummary = new ShiftSummaryScheduler(db, mail, (now) => board.board(now), logger);
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
          'font-src': ["'self'", 'data:'],
          // Tablets reach the hub over plain HTTP on the shop's network; do not force HTTPS sub-requests.
          'upgrade-insecure-requests': null,
        },
      },
      strictTransportSecurity: env.TRUST_PROXY,
    }),
  );
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => !req.url?.startsWith('/api') },
      // One short line per API call: method, path, status, time. Cookies and bodies never reach the log.
      serializers: {
        req: (req: { method: string; url: string }) => ({ method: req.method, url: req.url }),
        res: (res: { statusCode: number }) => ({ status: res.statusCode }),
      },
    }),
  );

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
  api.use('/shop', shopRouter(db, floor));
  api.use('/people', peopleRouter(db));
  api.use('/customers', customersRouter(db));
  api.use('/orders', ordersRouter(db));
  api.use('/designs', designsRouter(env));
  api.use(materialsRouter(db));
  api.use(jobsRouter(db, env));
  api.use(bagsRouter(db));
  api.use(labelsRouter(db, env));
  api.use('/press-cards', pressCardsRouter(db));
  api.use('/presses', pressesRouter(db));
  api.use('/recipes', recipesRouter(db));
  api.use('/events', eventsRouter(db, followers));
  api.use('/tickets', ticketsRouter(db));
  api.use('/spoil-reasons', spoilReasonsRouter(db));
  api.use('/spoils', photosRouter(db, env));
  api.use(cutPlansRouter(db, env, floor, new RollLowNotice(mail)));
  api.use(cuttersRouter(db, floor));
  api.use('/rolls', rollsRouter(db));
  api.use('/board', boardRouter(db));
  api.use('/reports', reportsRouter(db));
  api.use('/mail', mailRouter(db, mail, shiftSummary));
  api.use(apiNotFound);

  app.use('/api', api);
  app.use(staticApp(browserDist));
  app.use(errorHandler);
  return { app, session, floor, followers, mail, shiftSummary };
}
