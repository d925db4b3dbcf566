import { knexConfig } from './server/db/connection';
import { localDatabaseUrl } from './server/bootstrap/local-database-url';

// For the Knex CLI: `node --import tsx node_modules/knex/bin/cli.js --knexfile knexfile.ts migrate:status`.
export default knexConfig(process.env['DATABASE_URL'] ?? localDatabaseUrl());
