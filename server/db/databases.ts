import mysql from 'mysql2/promise';

/** Splits a MariaDB URL into the server part and the database name. */
export function splitDatabaseUrl(databaseUrl: string): { serverUrl: string; database: string } {
  const url = new URL(databaseUrl);
  const database = decodeURIComponent(url.pathname.replace(/^\//, ''));
  if (!/^[A-Za-z0-9_]+$/.test(database)) {
    throw new Error(`The database name in DATABASE_URL ("${database}") must be letters, digits and underscores.`);
  }
  url.pathname = '/';
  return { serverUrl: url.toString(), database };
}

/** The URL of another database on the same server. */
export function withDatabase(databaseUrl: string, database: string): string {
  const url = new URL(databaseUrl);
  url.pathname = `/${database}`;
  return url.toString();
}

async function onServer<T>(databaseUrl: string, work: (conn: mysql.Connection, database: string) => Promise<T>): Promise<T> {
  const { serverUrl, database } = splitDatabaseUrl(databaseUrl);
  const conn = await mysql.createConnection({ uri: serverUrl });
  try {
    return await work(conn, database);
  } finally {
    await conn.end();
  }
}

/** Creates the URL's database if it is not there (utf8mb4, so names with accents survive). */
export function createDatabase(databaseUrl: string): Promise<void> {
  return onServer(databaseUrl, async (conn, database) => {
    await conn.query(`CREATE DATABASE IF NOT EXISTS \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  });
}

/** Drops the URL's database. */
export function dropDatabase(databaseUrl: string): Promise<void> {
  return onServer(databaseUrl, async (conn, database) => {
    await conn.query(`DROP DATABASE IF EXISTS \`${database}\``);
  });
}

/** Drops every database whose name starts with the prefix (a test run's throwaways). */
export function dropDatabasesStartingWith(databaseUrl: string, prefix: string): Promise<string[]> {
  return onServer(databaseUrl, async (conn) => {
    const [rows] = await conn.query<mysql.RowDataPacket[]>('SHOW DATABASES');
    const names = rows.map((row) => String(Object.values(row)[0])).filter((name) => name.startsWith(prefix));
    for (const name of names) await conn.query(`DROP DATABASE IF EXISTS \`${name}\``);
    return names;
  });
}
