// The two PostgreSQL roles Holdfast runs with, and the SQL that provisions them.
//   holdfast_owner  owns the database, the schema and every table; migrations and seeds run as it.
//   holdfast_app    the server's login: reads and writes rows, nothing else (no TRUNCATE, no DDL,
//                   not superuser, so it cannot disable triggers or set session_replication_role).
// The grants themselves live in a migration (db/migrations/20261203030000_*), with ALTER DEFAULT
// PRIVILEGES so that tables added by later migrations are granted to holdfast_app by themselves.
import { createHmac } from 'node:crypto';

export const OWNER_ROLE = 'holdfast_owner';
export const APP_ROLE = 'holdfast_app';

/** A role's password, derived from the cluster's secret so no second secret file is needed. */
export function rolePassword(secret, role) {
  return createHmac('sha256', secret).update(`holdfast role ${role}`).digest('base64url');
}

const quote = (s) => `'${String(s).replace(/'/g, "''")}'`;
const ident = (s) => `"${String(s).replace(/"/g, '""')}"`;

/** Run once per cluster, as a superuser (any database): create both roles, set their passwords. */
export function clusterRolesSql(secret) {
  const create = (role) => `
    DO $$ BEGIN
      IF NOT EXISTS (SELECT FROM pg_roles WHERE rolname = ${quote(role)}) THEN
        CREATE ROLE ${ident(role)} LOGIN;
      END IF;
    EXCEPTION WHEN duplicate_object OR unique_violation THEN NULL; -- created meanwhile
    END $$;`;
  const limits = 'LOGIN NOSUPERUSER NOCREATEDB NOCREATEROLE NOREPLICATION NOBYPASSRLS';
  return [
    create(OWNER_ROLE),
    create(APP_ROLE),
    `ALTER ROLE ${ident(OWNER_ROLE)} WITH ${limits} PASSWORD ${quote(rolePassword(secret, OWNER_ROLE))};`,
    `ALTER ROLE ${ident(APP_ROLE)} WITH ${limits} NOINHERIT PASSWORD ${quote(rolePassword(secret, APP_ROLE))};`,
  ].join('\n');
}

/**
 * Run in database `db`, as a superuser: the owner role owns the database, its public schema and
 * (for a database first built by the superuser) every table, sequence, function and type in the
 * application's schemas; the app role may connect, and nobody else may.
 */
export function databaseRolesSql(db) {
  const owner = ident(OWNER_ROLE);
  return `
    ALTER DATABASE ${ident(db)} OWNER TO ${owner};
    REVOKE ALL ON DATABASE ${ident(db)} FROM PUBLIC;
    GRANT CONNECT, TEMPORARY ON DATABASE ${ident(db)} TO ${ident(APP_ROLE)};
    ALTER SCHEMA public OWNER TO ${owner};
    REVOKE CREATE ON SCHEMA public FROM PUBLIC;
    DO $$
    DECLARE r record;
    BEGIN
      IF EXISTS (SELECT FROM pg_namespace WHERE nspname = 'pgboss') THEN
        ALTER SCHEMA pgboss OWNER TO ${owner};
      END IF;
      FOR r IN
        SELECT c.oid::regclass AS name, c.relkind FROM pg_class c
        JOIN pg_namespace n ON n.oid = c.relnamespace
        WHERE n.nspname IN ('public', 'pgboss') AND c.relkind IN ('r', 'p', 'v', 'm', 'S')
          AND pg_get_userbyid(c.relowner) <> ${quote(OWNER_ROLE)}
          AND NOT EXISTS (SELECT FROM pg_depend d WHERE d.objid = c.oid AND d.deptype = 'e')
          -- a sequence behind a serial or identity column follows its table
          AND NOT (c.relkind = 'S' AND EXISTS (SELECT FROM pg_depend d
            WHERE d.objid = c.oid AND d.deptype IN ('a', 'i')))
      LOOP
        EXECUTE format('ALTER %s %s OWNER TO ${owner}',
          CASE r.relkind WHEN 'S' THEN 'SEQUENCE' WHEN 'v' THEN 'VIEW'
            WHEN 'm' THEN 'MATERIALIZED VIEW' ELSE 'TABLE' END, r.name);
      END LOOP;
      FOR r IN
        SELECT p.oid::regprocedure AS name FROM pg_proc p
        JOIN pg_namespace n ON n.oid = p.pronamespace
        WHERE n.nspname IN ('public', 'pgboss') AND pg_get_userbyid(p.proowner) <> ${quote(OWNER_ROLE)}
          AND NOT EXISTS (SELECT FROM pg_depend d WHERE d.objid = p.oid AND d.deptype = 'e')
      LOOP
        EXECUTE format('ALTER ROUTINE %s OWNER TO ${owner}', r.name);
      END LOOP;
      FOR r IN
        SELECT t.oid::regtype AS name FROM pg_type t
        JOIN pg_namespace n ON n.oid = t.typnamespace
        WHERE n.nspname IN ('public', 'pgboss') AND t.typtype IN ('e', 'd')
          AND pg_get_userbyid(t.typowner) <> ${quote(OWNER_ROLE)}
          AND NOT EXISTS (SELECT FROM pg_depend d WHERE d.objid = t.oid AND d.deptype = 'e')
      LOOP
        EXECUTE format('ALTER TYPE %s OWNER TO ${owner}', r.name);
      END LOOP;
    END $$;`;
}
