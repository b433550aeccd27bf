import { Router } from 'express';
import { activityRoutes } from './activity/activity.routes';
import { attachmentsRoutes } from './attachments/attachments.routes';
import { authRoutes } from './auth/auth.routes';
import { csrfProtection } from './auth/csrf';
import { createAuthenticator } from './auth/passport';
import { requestShopScope } from './auth/request-shop';
import { sessionMiddleware } from './auth/sessions';
import { sessionTimeouts } from './auth/session-timeouts';
import { catalogRoutes } from './catalog/catalog.routes';
import { cutListRoutes } from './cut-list/cut-list.routes';
import { AppError } from './http/app-error';
import { healthRoutes } from './http/health.routes';
import type { RouteContext } from './http/route-context';
import { jobsRoutes } from './jobs/jobs.routes';
import { labelsRoutes } from './labels/labels.routes';
import { LiveStreams } from './live/live-streams';
import { liveRoutes } from './live/live.routes';
import { mailRoutes } from './mail/outbox.routes';
import { PackPool } from './packs/pack-pool';
import { PackProgressBoard } from './packs/pack-progress';
import { packsRoutes } from './packs/packs.routes';
import { panelsRoutes } from './panels/panels.routes';
import { plannerRoutes } from './planner/planner.routes';
import { settingsRoutes } from './settings/settings.routes';
import { signUpRoutes } from './signup/sign-up.routes';
import { swapRoutes } from './swap/swap.routes';
import { teamRoutes } from './team/team.routes';
import type { AppDeps } from './app';

/**
 * Everything under /api: sessions, CSRF, sign-in, then each feature's routes, registered directly
 * on this router (so the role matrix test can list them), and a JSON 404 for any other path.
 */
export function createApiRouter(deps: AppDeps): Router {
  const { db, config } = deps;
  const context: RouteContext = {
    db,
    config,
    clock: deps.clock ?? (() => new Date()),
    authenticator: createAuthenticator(db, config.demoAccounts),
    mailer: deps.mailer,
    sessionSecret: deps.sessionSecret,
    // A pool starts no thread until a pack is asked for.
    packPool: deps.packPool ?? new PackPool(deps.logger),
    packProgress: new PackProgressBoard(db, (err) => deps.logger.warn({ err }, 'writing pack progress failed')),
    liveStreams: deps.liveStreams ?? new LiveStreams(db, deps.jobEvents),
  };
  const router = Router();
  router.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  router.use(
    sessionMiddleware(db, { secret: deps.sessionSecret, secure: config.secureCookies, idleMs: config.session.idleMs }),
    // Before the timeouts: a request from a session that has just expired should answer 401, not 403.
    csrfProtection,
    sessionTimeouts(config.session, context.clock),
    context.authenticator.initialize(),
    context.authenticator.session(),
    // From here on every query runs as the signed-in member's shop (server/db/shop-scope.ts).
    requestShopScope,
  );
  for (const routes of [healthRoutes, authRoutes, jobsRoutes, panelsRoutes, activityRoutes, packsRoutes, mailRoutes, plannerRoutes, teamRoutes, catalogRoutes, cutListRoutes, attachmentsRoutes, swapRoutes, labelsRoutes, settingsRoutes, liveRoutes, signUpRoutes]) routes(router, context);
  router.use((req, _res, next) => next(new AppError(404, 'not-found', `There is no API route ${req.method} ${req.originalUrl.split('?')[0]}.`)));
  return router;
}
