import type { Request, RequestHandler } from 'express';
import type { User } from '@/shared/api/auth';
import { can, ROLE_LABELS, type Capability, type Role } from '@/shared/roles';
import type { AuthService } from '@/server/services/auth';

/**
 * Load the session's user from the database on every request, so a role change applies at once and a
 * removed member is signed out at once. A session whose account is gone is destroyed.
 */
export function loadSessionUser(auth: AuthService): RequestHandler {
  return async (req, _res, next) => {
    const userId = req.session?.userId;
    if (userId === undefined) return next();
    const user = await auth.findUser(userId);
    if (user) {
      req.user = user;
      return next();
    }
    req.session.destroy(() => next());
  };
}

export const NOT_SIGNED_IN = 'Sign in to continue.';

/** 401 unless someone is signed in. */
export const requireUser: RequestHandler = (req, res, next) => {
  if (!req.user) {
    res.status(401).json({ error: NOT_SIGNED_IN });
    return;
  }
  next();
};

function guard(allowed: (role: Role) => boolean): RequestHandler {
  return (req, res, next) => {
    if (!req.user) {
      res.status(401).json({ error: NOT_SIGNED_IN });
      return;
    }
    if (!allowed(req.user.role)) {
      res.status(403).json({ error: `Your role (${ROLE_LABELS[req.user.role]}) does not allow this.` });
      return;
    }
    next();
  };
}

/** 401 when signed out, 403 unless the user's role is one of `roles`. */
export const requireRole = (...roles: Role[]): RequestHandler => guard((role) => roles.includes(role));

/** 401 when signed out, 403 unless the role has `capability` in the shared role table (shared/roles.ts). */
export const requireCapability = (capability: Capability): RequestHandler => guard((role) => can(role, capability));

/** 401 when signed out, 403 unless the role has at least one of `capabilities` (the service checks the exact one). */
export const requireAnyCapability = (...capabilities: Capability[]): RequestHandler =>
  guard((role) => capabilities.some((capability) => can(role, capability)));

/** The signed-in user in a handler behind one of the guards above. */
export function currentUser(req: Request): User {
  if (!req.user) throw new Error('currentUser() used on a route without requireUser');
  return req.user;
}
