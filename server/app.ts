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
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // react-native-web writes its styles into a <style> element at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
        },
      },
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
