import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { Actor } from './require';
import type { AuthService } from '../modules/auth/auth.service';

interface SessionUser {
  id: number;
  v: number;
  /** How the session was opened; absent in sessions made before it was stored (password). */
  m?: 'password' | 'pin';
}

/** Wire passport: local strategy for e-mail + password, session holds id and session version. */
export function configurePassport(auth: AuthService) {
  const p = new passport.Passport();
  p.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      auth.verifyPassword(email, password).then(
        (user) => done(null, user),
        (err) => done(err),
      );
    }),
  );
  p.serializeUser((user, done) => {
    const u = user as Actor & { sessionVersion?: number; signedInWith?: 'password' | 'pin' };
    done(null, { id: u.id, v: u.sessionVersion ?? 1, m: u.signedInWith ?? 'password' } satisfies SessionUser);
  });
  p.deserializeUser((stored: SessionUser, done) => {
    auth.actorForSession(stored.id, stored.v, stored.m === 'pin' ? 'pin' : 'password').then(
      (actor) => done(null, actor ?? false),
      (err) => done(err),
    );
  });
  return p;
}
