// Runs before each API or worker test file: clone the migrated template into a database of the
// file's own and point the app's configuration at it before any server module is imported.
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { inject } from 'vitest';

const adminUrl = inject('databaseAdminUrl');
const name = `spurwood_test_${randomBytes(6).toString('hex')}`;

const admin = new pg.Client({ connectionString: adminUrl });
await admin.connect();
await admin.query(`CREATE DATABASE ${name} TEMPLATE ${inject('templateDatabase')}`);
await admin.end();

process.env.NODE_ENV = 'test';
process.env.DATABASE_URL = adminUrl.replace(/\/postgres$/, `/${name}`);
process.env.SMTP_URL = `smtp://127.0.0.1:${inject('smtpPort')}`;
process.env.APP_URL = 'http://127.0.0.1:3999';
process.env.BCRYPT_COST = '4';
// Photos a test uploads land in a folder of the file's own, never in the project's .data/uploads.
process.env.UPLOAD_DIR = fs.mkdtempSync(path.join(os.tmpdir(), 'spurwood-uploads-'));
