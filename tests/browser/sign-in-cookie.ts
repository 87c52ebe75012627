// Signing in without a browser, for browser-stage tests that only need a session cookie: the harness's
// own (signInAsDemo puts it in a page's context).
export { signInCookie } from './harness';
