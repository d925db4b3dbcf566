import { localDatabaseUrl } from './local-database-url';
import { ensureLocalMariadb, type LocalMariadb } from './mariadb';

/** The database server to use: DATABASE_URL's, or the project's own MariaDB, started if needed. */
export async function databaseServer(
  configuredUrl: string | undefined,
  log: (line: string) => void,
): Promise<{ databaseUrl: string; local: LocalMariadb | null }> {
  if (configuredUrl) {
    log('Using the MariaDB server in DATABASE_URL.');
    return { databaseUrl: configuredUrl, local: null };
  }
  const local = await ensureLocalMariadb(log);
  return { databaseUrl: localDatabaseUrl(), local };
}
