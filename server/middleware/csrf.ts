import { csrfSync } from 'csrf-sync';

// Synchroniser tokens kept in the session; the client sends the token in `x-csrf-token`.
export const { csrfSynchronisedProtection: csrfProtection, generateToken: csrfToken } = csrfSync({
  getTokenFromRequest: (req) => req.get('x-csrf-token'),
});
