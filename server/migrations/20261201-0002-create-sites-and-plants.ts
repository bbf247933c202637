import type { Migration } from '../lib/migrator';

export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    CREATE TABLE sites (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      group_id uuid NOT NULL REFERENCES groups(id) ON DELETE CASCADE,
      name varchar(100) NOT NULL,
      latitude double precision NOT NULL CHECK (latitude BETWEEN -90 AND 90),
      longitude double precision NOT NULL CHECK (longitude BETWEEN -180 AND 180),
      elevation_m double precision,
      time_zone varchar(64) NOT NULL,
      hazards varchar(30)[] NOT NULL DEFAULT '{}',
      notes text NOT NULL DEFAULT '',
      archived_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX sites_group_id ON sites (group_id);

    CREATE TABLE plants (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      group_id uuid NOT NULL REFERENCES groups(id) ON DELETE CASCADE,
      site_id uuid NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      type_code varchar(30) NOT NULL,
      cultivar varchar(100) NOT NULL DEFAULT '',
      rootstock varchar(60) NOT NULL DEFAULT '',
      form varchar(30) NOT NULL,
      planted_year integer,
      height_m double precision CHECK (height_m > 0),
      position_label varchar(100) NOT NULL DEFAULT '',
      health_flags varchar(30)[] NOT NULL DEFAULT '{}',
      notes text NOT NULL DEFAULT '',
      archived_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX plants_group_id ON plants (group_id);
    CREATE INDEX plants_site_id ON plants (site_id);
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query('DROP TABLE plants, sites');
};
