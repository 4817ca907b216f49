import type { UserDto } from '@shared/schemas/auth';

/**
 * What the floor screens need to open with no network: the person last signed in on this device, and
 * a sign-out the server has not heard yet. Both live in localStorage; the server still decides every
 * request, so the kept user only lets the screen (and the outbox) open.
 */
const USER_KEY = 'seamrun.session.user';
const SIGN_OUT_KEY = 'seamrun.session.signOutPending';

export function keepUser(user: UserDto | null) {
  if (user) localStorage.setItem(USER_KEY, JSON.stringify(user));
  else localStorage.removeItem(USER_KEY);
}

export function keptUser(): UserDto | null {
  if (signOutPending()) return null;
  try {
    return JSON.parse(localStorage.getItem(USER_KEY) ?? 'null') as UserDto | null;
  } catch {
    return null;
  }
}

/** Signed out with no network: forget the user now, end the server session at the next chance. */
export function markSignedOutOffline() {
  localStorage.removeItem(USER_KEY);
  localStorage.setItem(SIGN_OUT_KEY, '1');
}

export const signOutPending = () => localStorage.getItem(SIGN_OUT_KEY) === '1';
export const clearSignOutPending = () => localStorage.removeItem(SIGN_OUT_KEY);
