import compression from 'compression';
import express, { type Express } from 'express';
import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import { securityHeaders } from './http/security';
import { sessionMiddleware } from './http/session-middleware';
import { devWebProxy } from './http/dev-proxy';
import { saveBodiesAsText } from './http/document-body';
import { webApp } from './http/web-app';
import type { Mailer } from './mail/mailer';
import { loadSessionUser } from './middleware/auth';
import { apiNotFound, BODY_LIMIT_BYTES, errorHandler } from './middleware/errors';
import { refuseCrossSite } from './middleware/origin';
import { getModels } from './models';
import { apiRoutes } from './routes';
import { createServices } from './services';
import { createPasswords } from './services/passwords';

export type AppDeps = { sequelize: Sequelize; mailer: Mailer; config: Config; clock?: () => number };

/** Build the whole HTTP app on a migrated database; the caller decides where it listens. */
export function createApp({ sequelize, mailer, config, clock = Date.now }: AppDeps): Express {
  const models = getModels(sequelize);
  const services = createServices({ sequelize, models, mailer, config, passwords: createPasswords(config.bcryptCost), clock });
  const app = express();

  app.disable('x-powered-by');
  // No ETag computed over every answer's body (a hash of many megabytes on the request thread for a
  // large document); the answers that can be revalidated set their own (server/http/cache.ts), and
  // the web app's files get theirs from express.static.
  app.set('etag', false);
  // X-Forwarded-For and X-Forwarded-Proto are believed only from the proxies TRUST_PROXY names
  // (none by default in production): anyone else could set them to dodge the sign-in limits.
  app.set('trust proxy', config.trustProxy.length > 0 ? config.trustProxy : false);

  // gzip or brotli (quality 4, compression's default) for the page, the bundles and every JSON answer.
  app.use(compression());
  app.use(securityHeaders(config.isProduction));
  app.use(refuseCrossSite(config.trustedOrigins));

  const api = express.Router();
  api.use(saveBodiesAsText());
  api.use(express.json({ limit: BODY_LIMIT_BYTES }));
  api.use(sessionMiddleware(sequelize, config));
  api.use(loadSessionUser(services.auth));
  api.use((_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  api.use(apiRoutes(services, mailer.mailbox, config));
  app.use('/api', api);

  app.use(config.webDevServer ? devWebProxy(config.webDevServer) : webApp(config.webDir));
  app.use(apiNotFound);
  app.use(errorHandler);
  return app;
}
