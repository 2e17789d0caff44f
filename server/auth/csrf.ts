import { csrfSync } from 'csrf-sync';

/** Synchroniser-token CSRF protection (OWASP ASVS 4.0.3, 4.2.2): the token lives in the session. */
export function createCsrf() {
  return csrfSync({
    getTokenFromRequest: (req) => {
      const header = req.headers['x-csrf-token'];
      return Array.isArray(header) ? header[0] : header;
    },
  });
}
