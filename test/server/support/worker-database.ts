import { workerDatabaseUrl } from './test-database';

process.env['DATABASE_URL'] = workerDatabaseUrl();
