import type { Role } from '../../shared/roles.js';

declare global {
  namespace Express {
    /** The signed-in user as passport puts it on the request. */
    interface User {
      id: number;
      email: string;
      name: string;
      role: Role;
    }
  }
}

declare module 'express-session' {
  interface SessionData {
    /** Epoch ms of sign-in, for the absolute timeout. */
    signedInAt?: number;
    passport?: { user?: number };
  }
}

export {};
