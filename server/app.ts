import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';

import { type AppContext } from './context';
import { errorHandler } from './http/error-handler';
import { mountApi } from './routes';

/** Builds the app without listening, so tests drive it with supertest. */
export function createApp(context: AppContext): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', context.trustProxy);
  // HSTS and upgrade-insecure-requests only behind HTTPS: a phone on the studio's own network
  // must still reach a plain-HTTP install.
  const https = context.publicUrl?.startsWith('https://') ?? false;
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // react-native-web writes its styles into a <style> element at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': https ? [] : null,
        },
      },
      strictTransportSecurity: https,
    }),
  );
  app.use(
    pinoHttp({
      logger: context.logger,
      autoLogging: { ignore: (req) => req.url === '/api/health' },
    }),
  );

  mountApi(app, context);
  if (context.web) app.use(context.web);

  app.use(errorHandler(context.logger));
  return app;
}
