import type { Migration } from '../lib/migrator';

// Daily temperatures are stored in °C whatever unit they were entered in; one row per site and day.
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    CREATE TABLE site_readings (
      site_id uuid NOT NULL REFERENCES sites(id) ON DELETE CASCADE,
      date date NOT NULL,
      tmin_c real NOT NULL CHECK (tmin_c BETWEEN -60 AND 60),
      tmax_c real NOT NULL CHECK (tmax_c BETWEEN -60 AND 60),
      rain_mm real CHECK (rain_mm >= 0),
      source varchar(12) NOT NULL CHECK (source IN ('upload', 'manual', 'station')),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (site_id, date),
      CHECK (tmin_c <= tmax_c)
    );

    CREATE TABLE site_normals (
      site_id uuid NOT NULL REFERENCES sites(id) ON DELETE CASCADE,
      month smallint NOT NULL CHECK (month BETWEEN 1 AND 12),
      tmin_c real NOT NULL,
      tmax_c real NOT NULL,
      source varchar(12) NOT NULL CHECK (source IN ('manual', 'computed')),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (site_id, month),
      CHECK (tmin_c <= tmax_c)
    );

    ALTER TABLE sites ADD COLUMN station_id varchar(64);
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query('ALTER TABLE sites DROP COLUMN station_id; DROP TABLE site_normals, site_readings');
};
