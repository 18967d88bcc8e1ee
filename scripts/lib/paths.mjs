import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
export const DATA_DIR = join(ROOT, '.data');
export const PG_DIR = join(DATA_DIR, 'postgres');
export const PG_DATA = join(PG_DIR, 'data');
export const PG_SOCKET = join(PG_DIR, 'socket');
export const API_DIST_MAIN = join(ROOT, 'apps/api/dist/main.js');
export const API_DB_CLI = join(ROOT, 'apps/api/dist/database/cli.js');
export const WEB_DIST = join(ROOT, 'apps/web/dist');
