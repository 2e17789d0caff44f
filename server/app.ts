import { existsSync } from 'node:fs';
import path from 'node:path';
import cookieParser from 'cookie-parser';
import express, { type Express, type RequestHandler } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import type { DataSource } from 'typeorm';
import { createCsrf } from './auth/csrf.js';
import { createPassport } from './auth/passport.js';
import { signInLimits } from './auth/rate-limits.js';
import { DatabaseSessionStore } from './auth/session-store.js';
import type { Config } from './config.js';
import { Store } from './db/store.js';
import type { FakeMailServer } from './fakes/mail-server.js';
import { ApiRouter, type RouteSpec } from './http/api-router.js';
import { serveClient } from './http/client-files.js';
import { apiNotFound, errorHandler } from './http/error-handler.js';
import { ApiError } from './http/errors.js';
import { buildOpenApiDocument } from './http/openapi.js';
import { Mailer } from './mail/mailer.js';
import { adminRoutes } from './routes/admin.routes.js';
import { backupRoutes } from './routes/backups.routes.js';
import { artifactImportRoutes } from './routes/artifact-import.routes.js';
import { artifactRoutes } from './routes/artifacts.routes.js';
import { mediaRoutes } from './routes/media.routes.js';
import { authRoutes } from './routes/auth.routes.js';
import { calcRoutes } from './routes/calc.routes.js';
import { compartmentRoutes } from './routes/compartments.routes.js';
import { conditionReportRoutes } from './routes/condition-reports.routes.js';
import { incidentRoutes } from './routes/incidents.routes.js';
import { riskRoutes } from './routes/risks.routes.js';
import { repairProjectRoutes } from './routes/repair-projects.routes.js';
import { deckRoutes } from './routes/decks.routes.js';
import { hazardRoutes } from './routes/hazards.routes.js';
import { planRoutes } from './routes/plans.routes.js';
import { interpretationRoutes } from './routes/interpretations.routes.js';
import { invitationRoutes } from './routes/invitations.routes.js';
import { publicRoutes } from './routes/public.routes.js';
import { tourReviewRoutes } from './routes/tour-review.routes.js';
import { tourRoutes } from './routes/tours.routes.js';
import { TourPublicService } from './services/tour-public.service.js';
import { TourReviewService } from './services/tour-review.service.js';
import { TourRevisionService } from './services/tour-revisions.service.js';
import { TourService } from './services/tour.service.js';
import { donationRoutes } from './routes/donations.routes.js';
import { givingPublicRoutes } from './routes/giving.routes.js';
import { AppealService } from './services/appeal.service.js';
import { CheckoutService } from './services/checkout.service.js';
import { DonationService } from './services/donation.service.js';
import { GivingReceipts } from './services/giving-receipts.js';
import { StripeWebhookService } from './services/stripe-webhook.service.js';
import { createStripeClient, type StripeClient } from './payments/stripe-client.js';
import { userRoutes } from './routes/users.routes.js';
import { vesselRoutes } from './routes/vessels.routes.js';
import { ArtifactImportService } from './services/artifact-import.service.js';
import { ArtifactService } from './services/artifact.service.js';
import { AuditService } from './services/audit.service.js';
import { BackupService } from './services/backup.service.js';
import { MediaService } from './services/media.service.js';
import { AuthService } from './services/auth.service.js';
import { CompartmentService } from './services/compartment.service.js';
import { ConditionAlerts } from './services/condition-alerts.js';
import { ConditionReportService } from './services/condition-report.service.js';
import { IncidentService } from './services/incident.service.js';
import { ClosureService } from './services/closure.service.js';
import { RiskService } from './services/risk.service.js';
import { RepairProjectService } from './services/repair-project.service.js';
import { TreatmentService } from './services/treatment.service.js';
import { DeckService } from './services/deck.service.js';
import { HazardService } from './services/hazard.service.js';
import { PlanService } from './services/plan.service.js';
import { FileStore } from './storage/file-store.js';
import { HealthService } from './services/health.service.js';
import { InterpretationService } from './services/interpretation.service.js';
import { InvitationService } from './services/invitation.service.js';
import { OutboxService } from './services/outbox.service.js';
import { PasswordService } from './services/password.service.js';
import { SettingsService } from './services/settings.service.js';
import { UserService } from './services/user.service.js';
import { VesselService } from './services/vessel.service.js';
import { appVersion as version } from './version.js';

const WEBHOOK_PATH = '/api/v1/webhooks/stripe';

export interface AppDeps {
  config: Config;
  dataSource: DataSource;
  fakeMail: FakeMailServer | null;
  /** The Stripe SDK, built once for Stripe or the fake (index.ts knows the fake's port). */
  stripe?: StripeClient;
}

export interface ShipkeeperApp {
  app: Express;
  /** The API router and its declared routes (the authorization test enumerates both). */
  api: ApiRouter;
  plans: PlanService;
  backups: BackupService;
  files: FileStore;
  routes: RouteSpec[];
  sessions: DatabaseSessionStore;
  close(): void;
}


/** Ends a signed-in session that is older than the absolute timeout (OWASP ASVS 4.0.3, 3.3.2). */
function absoluteTimeout(hours: number): RequestHandler {
  return (req, _res, next) => {
    const started = req.session?.signedInAt;
    if (req.user && started && Date.now() - started > hours * 3_600_000) {
      req.session.regenerate((err) => {
        req.user = undefined;
        next(err);
      });
      return;
    }
    next();
  };
}

export function createApp({ config, dataSource, fakeMail, stripe = createStripeClient(config.stripe) }: AppDeps): ShipkeeperApp {
  const store = new Store(dataSource);
  const sessions = new DatabaseSessionStore(dataSource, config.sessionIdleMinutes * 60_000);
  const mailer = new Mailer(config.mail, fakeMail?.port ?? null);

  const auth = new AuthService(store, config);
  const passport = createPassport(auth);
  const csrf = createCsrf({ secret: config.sessionSecret, secureCookies: config.secureCookies });
  const settings = new SettingsService(store);
  const vessels = new VesselService(store);
  const files = new FileStore(config.uploadsDir);
  const plans = new PlanService(store, files, config);

  const api = new ApiRouter();
  authRoutes(api, { auth, passport, passwords: new PasswordService(store, mailer, sessions, config), limits: signInLimits(config), generateCsrfToken: csrf.generateToken });
  userRoutes(api, new UserService(store, sessions));
  invitationRoutes(api, new InvitationService(store, mailer, config));
  vesselRoutes(api, vessels);
  deckRoutes(api, new DeckService(store, files));
  compartmentRoutes(api, new CompartmentService(store));
  hazardRoutes(api, new HazardService(store));
  planRoutes(api, plans, { incomingDir: files.incoming, maxBytes: config.planMaxBytes });
  artifactImportRoutes(api, new ArtifactImportService(store), { incomingDir: files.incoming });
  artifactRoutes(api, new ArtifactService(store));
  const alerts = new ConditionAlerts(store, mailer, config);
  const conditionReports = new ConditionReportService(store, alerts, files);
  conditionReportRoutes(api, conditionReports);
  const closures = new ClosureService(store);
  incidentRoutes(api, new IncidentService(store, conditionReports, alerts), closures);
  riskRoutes(api, new RiskService(store));
  repairProjectRoutes(api, new RepairProjectService(store), new TreatmentService(store));
  const media = new MediaService(store, files);
  interpretationRoutes(api, new InterpretationService(store, mailer, config), media);
  mediaRoutes(api, media, { incomingDir: files.incoming, maxBytes: config.mediaMaxBytes });
  const tours = new TourService(store, closures);
  tourRoutes(api, tours, media, { incomingDir: files.incoming, maxBytes: config.mediaMaxBytes });
  tourReviewRoutes(api, new TourReviewService(store, tours, closures, mailer, config), new TourRevisionService(store, tours));
  calcRoutes(api);
  adminRoutes(api, { audit: new AuditService(store), settings, outbox: new OutboxService(fakeMail) });
  const webhooks = new StripeWebhookService(store, stripe, new GivingReceipts(store, mailer));
  const checkout = new CheckoutService(store, stripe, webhooks, config.publicUrl);
  givingPublicRoutes(api, { checkout, webhooks, files });
  donationRoutes(api, new DonationService(store, stripe, webhooks), new AppealService(store));
  const backups = new BackupService(config);
  backupRoutes(api, backups);
  let openApi: object | null = null;
  publicRoutes(api, {
    health: new HealthService(dataSource, fakeMail, version),
    vessels,
    settings,
    closures,
    tours: new TourPublicService(store, media),
    openApi: () => (openApi ??= buildOpenApiDocument(api.routes, version)),
  });

  const app = express();
  app.disable('x-powered-by');
  if (config.trustProxy) app.set('trust proxy', 1);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'font-src': ["'self'", 'data:'],
          'frame-src': ["'self'"],
          'upgrade-insecure-requests': config.secureCookies ? [] : null,
        },
      },
      strictTransportSecurity: false,
    }),
  );
  // HSTS on a plain-http answer is meaningless (RFC 6797, 7.2) and would pin a misconfigured host
  app.use((req, res, next) => {
    if (req.secure) res.setHeader('Strict-Transport-Security', 'max-age=31536000; includeSubDomains');
    next();
  });
  // The client is served before the session middleware, so its files never carry or refresh a cookie
  if (existsSync(path.join(config.clientDir, 'index.html'))) serveClient(app, config.clientDir);
  // Stripe signs the body as sent: the webhook keeps it raw (and body-parser's json then leaves it alone)
  app.use(WEBHOOK_PATH, express.raw({ type: () => true, limit: '1mb' }));
  app.use(express.json({ limit: '1mb' }));
  app.use(cookieParser());
  app.use('/api/v1', (req, _res, next) => {
    // req.is() is null without a body and false for a body of another type; a proxy may send an empty one
    const empty = req.headers['content-length'] === '0' && !req.headers['transfer-encoding'];
    if (!empty && req.is('application/json') === false && !req.is('multipart/form-data')) {
      return next(new ApiError(415, 'unsupported_media_type', 'Send the request body as JSON (Content-Type: application/json).'));
    }
    next();
  });
  app.use(
    session({
      name: 'shipkeeper.sid',
      secret: config.sessionSecret,
      store: sessions,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, maxAge: config.sessionIdleMinutes * 60_000 },
    }),
  );
  app.use(passport.initialize());
  app.use(passport.session());
  app.use(absoluteTimeout(config.sessionAbsoluteHours));

  app.use('/api/v1', (_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  // Stripe's calls carry no cookie and no token: their signature is their proof (checked in the route)
  app.use('/api/v1', (req, res, next) => (req.originalUrl.split('?')[0] === WEBHOOK_PATH ? next() : csrf.protect(req, res, next)), api.router);
  app.use('/api', apiNotFound);

  app.use(errorHandler);

  return {
    app,
    api,
    plans,
    backups,
    files,
    routes: api.routes,
    sessions,
    close: () => {
      backups.stop();
      sessions.close();
      mailer.close();
    },
  };
}
