import type { User } from '@/shared/api/auth';

declare global {
  namespace Express {
    interface Request {
      /** The signed-in user, loaded fresh from the database on every /api request (server/middleware/auth.ts). */
      user?: User;
    }
  }
}

declare module 'express-session' {
  interface SessionData {
    userId: number;
  }
}

export {};
