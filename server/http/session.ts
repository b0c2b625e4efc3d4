import type { Request, Response } from 'express';

export const SESSION_COOKIE = 'cablewright.sid';

/** Start a fresh session for `userId`: a new id on every sign-in, so an id planted before sign-in is worthless. */
export function startSession(req: Request, userId: number): Promise<void> {
  return new Promise((resolve, reject) => {
    req.session.regenerate((error) => {
      if (error) return reject(error);
      req.session.userId = userId;
      req.session.save((saveError) => (saveError ? reject(saveError) : resolve()));
    });
  });
}

/** Delete the session from the store (the old cookie is refused afterwards) and tell the browser to drop it. */
export function endSession(req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    req.session.destroy((error) => {
      if (error) return reject(error);
      res.clearCookie(SESSION_COOKIE, { path: '/' });
      resolve();
    });
  });
}
