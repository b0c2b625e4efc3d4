import type { QueryInterface } from 'sequelize';

/**
 * Triggers that refuse UPDATE and DELETE on an append-only table, in the database's own dialect:
 * SQLite's `RAISE(ABORT, …)` in a row trigger, PostgreSQL's PL/pgSQL function raising an exception.
 * The error names the table either way.
 */
export async function refuseChanges(qi: QueryInterface, table: string): Promise<void> {
  const message = `${table} rows are immutable`;
  if (qi.sequelize.getDialect() === 'postgres') {
    await qi.sequelize.query(
      `CREATE OR REPLACE FUNCTION ${table}_immutable() RETURNS trigger LANGUAGE plpgsql AS $$ ` +
        `BEGIN RAISE EXCEPTION '${message}'; END; $$`,
    );
    for (const verb of ['UPDATE', 'DELETE']) {
      await qi.sequelize.query(
        `CREATE TRIGGER ${table}_no_${verb.toLowerCase()} BEFORE ${verb} ON ${table} FOR EACH ROW EXECUTE FUNCTION ${table}_immutable()`,
      );
    }
    return;
  }
  for (const verb of ['UPDATE', 'DELETE']) {
    await qi.sequelize.query(`CREATE TRIGGER ${table}_no_${verb.toLowerCase()} BEFORE ${verb} ON ${table} BEGIN SELECT RAISE(ABORT, '${message}'); END;`);
  }
}

/** Drop what refuseChanges made (a migration's `down`). */
export async function allowChanges(qi: QueryInterface, table: string): Promise<void> {
  const postgres = qi.sequelize.getDialect() === 'postgres';
  for (const verb of ['update', 'delete']) await qi.sequelize.query(`DROP TRIGGER IF EXISTS ${table}_no_${verb}${postgres ? ` ON ${table}` : ''}`);
  if (postgres) await qi.sequelize.query(`DROP FUNCTION IF EXISTS ${table}_immutable()`);
}
