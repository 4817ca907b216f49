import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { can, type Permission, type Role } from '../../shared/auth/permissions';
import type { Language } from '../../shared/format/studio-format';
import { AppError, forbidden, unauthenticated } from '../errors';

/** The signed-in person as the server sees them on every request. */
export interface Actor {
  id: number;
  studioId: number;
  role: Role;
  name: string;
  email: string;
  /** Signed in with a temporary password: only the auth routes answer until it is changed. */
  mustChangePassword?: boolean;
  /** The person's own language; null or absent: the studio's. */
  language?: Language | null;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends Actor {}
  }
}

export function actorOf(req: Request): Actor {
  if (!req.user) throw unauthenticated();
  return req.user;
}

/** Someone on a temporary password may only reach /api/auth/* (to change it) until they do. */
export const requirePasswordChanged: RequestHandler = (req, _res, next) => {
  if (req.user?.mustChangePassword && !req.path.startsWith('/auth/')) {
    return next(new AppError(403, 'password_change_required', 'Choose your own password first (Account page)'));
  }
  next();
};

export const requireAuth: RequestHandler = Object.assign(
  ((req, _res, next) => (req.user ? next() : next(unauthenticated()))) as RequestHandler,
  { requiresAuth: true },
);

/** Gate a route on the permission map in shared/auth; 401 when signed out, 403 when not allowed. */
export function requirePermission(...permissions: Permission[]): RequestHandler {
  const gate = (req: Request, _res: Response, next: NextFunction) => {
    if (!req.user) return next(unauthenticated());
    if (!permissions.some((p) => can(req.user!.role, p))) return next(forbidden());
    next();
  };
  // The route-by-role matrix test reads the permissions off the handler.
  return Object.assign(gate, { permissions, requiresAuth: true });
}
