import type { Role } from './schemas/group';
import type { Logger } from 'pino';

declare global {
  namespace Express {
    interface User {
      id: string;
      email: string;
      name: string;
      isAdmin: boolean;
    }
    interface Request {
      id: string;
      membership?: { groupId: string; role: Role };
      log: Logger;
    }
  }
}

export {};
