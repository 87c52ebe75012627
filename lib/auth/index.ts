export { authOptions, SESSION_MAX_AGE_S, SESSION_RECHECK_MS } from './options';
export { authSecret } from './secret';
export { loadSessionUser, type CurrentUser } from './session-user';
export { authorizeCredentials, SIGN_IN_ERRORS, SIGN_IN_LIMITS } from './credentials';
