import fs from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import helmet from 'helmet';
import pg from 'pg';
import { pinoHttp } from 'pino-http';
import { config } from './config';
import { logger } from './lib/logger';
import { repoRoot } from './lib/paths';
import { csrfProtection } from './middleware/csrf';
import { errorHandler } from './middleware/error-handler';
import { apiNotFound } from './middleware/not-found';
import { requestId } from './middleware/request-id';
import { passport, sessionMiddleware } from './middleware/session';
import { authRouter } from './routes/auth.routes';
import { calendarRouter } from './routes/calendar.routes';
import { groupsRouter } from './routes/groups.routes';
import { healthRouter } from './routes/health.routes';
import { invitationLinkRouter } from './routes/invitations.routes';
import { adminRouter } from './routes/operations.routes';
import { remindersRouter } from './routes/reminders.routes';
import { toolsRouter } from './routes/tools.routes';
import { unsubscribeRouter } from './routes/unsubscribe.routes';
import { toolsLimit } from './middleware/tools-limit';

export interface AppOptions {
  /** Pool for the session store; the app makes its own from DATABASE_URL when none is given. */
  sessionPool?: pg.Pool;
  /** Serve the built client from dist/client (off in API tests). */
  serveClient?: boolean;
}

/** Builds the Express app without listening, so tests drive it through supertest. */
export function createApp(options: AppOptions = {}): Express {
  const app = express();
  app.set('trust proxy', 'loopback');
  app.disable('x-powered-by');

  app.use(requestId);
  app.use(
    pinoHttp({
      logger,
      genReqId: (req) => (req as express.Request).id,
      autoLogging: { ignore: (req) => !req.url?.startsWith('/api') || req.url === '/api/health' },
      // One short line per request; headers (cookies among them) stay out of the logs.
      serializers: { req: (req) => ({ id: req.id, method: req.method, url: req.url }), res: (res) => ({ status: res.statusCode }) },
    }),
  );
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // PrimeVue's theme writes its CSS variables into <style> tags at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': config.COOKIE_SECURE ? [] : null,
        },
      },
      // Only a server behind HTTPS may tell browsers to insist on HTTPS.
      strictTransportSecurity: config.COOKIE_SECURE,
    }),
  );
  app.use('/api', express.json({ limit: '256kb' }));

  app.use('/api/health', healthRouter);
  app.use('/api/tools', toolsLimit, toolsRouter);
  app.use('/api/calendar', calendarRouter);

  app.use('/api', sessionMiddleware(options.sessionPool ?? new pg.Pool({ connectionString: config.DATABASE_URL, max: 5 })));
  app.use('/api', passport.session());
  app.use('/api', csrfProtection);
  app.use('/api/auth', authRouter);
  app.use('/api/groups', groupsRouter);
  app.use('/api/invitations', invitationLinkRouter);
  app.use('/api/reminders', remindersRouter);
  app.use('/api/admin', adminRouter);
  app.use('/api', apiNotFound);
  app.use('/unsubscribe', unsubscribeRouter);

  if (options.serveClient ?? true) serveClient(app);
  app.use(errorHandler);
  return app;
}

// Deep links such as /plants/123 get index.html so the client router can take over.
function serveClient(app: Express): void {
  const dir = path.resolve(repoRoot, config.CLIENT_DIR);
  const indexHtml = path.join(dir, 'index.html');
  app.use(express.static(dir, { index: false, maxAge: '1h', setHeaders: (res, file) => file.includes(`${path.sep}assets${path.sep}`) && res.setHeader('Cache-Control', 'public, max-age=31536000, immutable') }));
  app.get('/{*path}', (_req, res, next) => {
    if (!fs.existsSync(indexHtml)) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexHtml);
  });
}
