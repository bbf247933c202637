import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type pg from 'pg';
import { config } from '../config';
import { findPerson, verifyCredentials } from '../services/account.service';

const PgStore = connectPgSimple(session);

const THIRTY_DAYS_MS = 30 * 24 * 60 * 60 * 1000;

export function sessionMiddleware(pool: pg.Pool) {
  return session({
    name: 'spurwood.sid',
    store: new PgStore({ pool, tableName: 'sessions', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
    secret: config.SESSION_SECRET,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.COOKIE_SECURE, maxAge: THIRTY_DAYS_MS },
  });
}

passport.use(
  new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
    verifyCredentials(email, password).then((person) => done(null, person ?? false), done);
  }),
);

// Only the id goes into the session; the person is read afresh on each request so a changed name or
// a removed account takes effect at once.
passport.serializeUser((user, done) => done(null, user.id));
passport.deserializeUser((id: string, done) => {
  findPerson(id).then((person) => done(null, person ?? false), done);
});

export { passport };
