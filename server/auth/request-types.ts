import type { User as ApiUser } from '../../shared/api/contract';

/** What the session and passport add to a request, typed once for the whole server. */
declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport's req.user is the API's user, loaded fresh from the database each request.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends ApiUser {}
  }
}

declare module 'express-session' {
  interface SessionData {
    /** The token the XSRF-TOKEN cookie carries; mutating requests echo it in X-XSRF-TOKEN. */
    csrfToken: string;
    /** Milliseconds since the epoch, by the app's clock: the absolute timeout counts from here. */
    signedInAt: number;
    /** Milliseconds since the epoch, by the app's clock: the idle timeout counts from here. */
    lastSeenAt: number;
    passport: { user?: number };
  }
}
