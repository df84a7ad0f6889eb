import type { IncomingMessage, ServerResponse } from 'node:http';
import type { UserModel } from '../db/models/user';

declare global {
  namespace Express {
    // The signed-in user, loaded fresh from the database on every request by passport.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends UserModel {}
  }
}

declare module 'express-serve-static-core' {
  interface Application {
    /** Express's own entry for each request (lib/application.js); server/app.ts puts the hot reads in front of it. */
    handle(req: IncomingMessage, res: ServerResponse, callback?: (error?: unknown) => void): void;
  }
}

export {};
