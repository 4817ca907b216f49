import { ApiError } from './api-client';
import { keepUser, markSignedOutOffline } from './offline-session';

/**
 * Sign out through `logout` (the server call). With no network the device forgets the person at once
 * and ends the server session before it sends anything else once it is back online.
 */
export async function signOutEvenOffline(logout: () => Promise<unknown>) {
  try {
    await logout();
    keepUser(null);
  } catch (e) {
    if (!(e instanceof ApiError && e.status === 0)) throw e;
    markSignedOutOffline();
  }
}
