export { allow, created, json, ownedRoute, route } from './route';
export {
  ApiError,
  badRequest,
  conflict,
  errorResponse,
  forbidden,
  isDatabaseUnavailable,
  notFound,
  unauthenticated,
} from './errors';
export { afterCursor, page, pageQuery } from './pagination';
export { sessionUser, sessionUserFromHeaders } from './session';
