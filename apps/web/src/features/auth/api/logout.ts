import { api, unwrap } from '../../../lib/api-client';

/** POST /api/auth/logout — ends this session; the API also clears its cookie. */
export function logout() {
  return unwrap(api.POST('/api/auth/logout'));
}

/** POST /api/auth/logout-all — ends every session of the account, this one included. */
export function logoutEverywhere() {
  return unwrap(api.POST('/api/auth/logout-all'));
}
