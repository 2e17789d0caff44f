import type { Request, RequestHandler, Response } from 'express';
import { doubleCsrf } from 'csrf-csrf';
import { csrfSync } from 'csrf-sync';

export interface Csrf {
  protect: RequestHandler;
  generateToken: (req: Request, res: Response, overwrite?: boolean) => string;
}

const tokenFromRequest = (req: Request) => {
  const header = req.headers['x-csrf-token'];
  return Array.isArray(header) ? header[0] : header;
};

/**
 * CSRF protection (OWASP ASVS 4.0.3, 4.2.2; OWASP CSRF Prevention Cheat Sheet). A signed-in person
 * has a session, and the synchroniser token lives in it. An anonymous caller gets a signed
 * double-submit cookie instead, so that asking for a token stores nothing on the server.
 */
export function createCsrf(options: { secret: string; secureCookies: boolean }): Csrf {
  const synchronised = csrfSync({ getTokenFromRequest: tokenFromRequest });
  const doubleSubmit = doubleCsrf({
    getSecret: () => options.secret,
    getSessionIdentifier: () => 'anonymous',
    cookieName: 'shipkeeper.csrf',
    cookieOptions: { sameSite: 'lax', path: '/', secure: options.secureCookies, httpOnly: true },
    getCsrfTokenFromRequest: tokenFromRequest,
    errorConfig: { statusCode: 403, code: 'EBADCSRFTOKEN', message: 'invalid csrf token' },
  });
  return {
    protect: (req, res, next) => (req.user ? synchronised.csrfSynchronisedProtection(req, res, next) : doubleSubmit.doubleCsrfProtection(req, res, next)),
    generateToken: (req, res, overwrite = false) =>
      req.user ? synchronised.generateToken(req, overwrite) : doubleSubmit.generateCsrfToken(req, res, { overwrite }),
  };
}
