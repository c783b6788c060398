// Backup and restore of the embedded PGlite database (the server must be stopped: one process per folder).
//   npm run db:backup [-- out.tar.gz]      → a gzip tarball of PGLITE_DIR (default data/local/backups/…)
//   npm run db:restore -- in.tar.gz        → a new PGLITE_DIR from the tarball (refuses a non-empty folder)
// While the server runs, a site administrator downloads the same tarball from GET /api/admin/backup.
// On a PostgreSQL server (DATABASE_URL) use pg_dump / pg_restore instead.
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { loadConfig } from '../config';
import { openDatabase } from './client';

const [command, file] = process.argv.slice(2);
const config = loadConfig();
if (config.databaseUrl) {
  console.error('DATABASE_URL is set: back up the PostgreSQL server with pg_dump, restore with pg_restore.');
  process.exit(2);
}

if (command === 'backup') {
  const database = await openDatabase(config);
  const blob = await database.dumpDataDir!();
  await database.close();
  const out =
    file ??
    path.join('data/local/backups', `pglite-${new Date().toISOString().replace(/[:.]/g, '-')}.tar.gz`);
  mkdirSync(path.dirname(out), { recursive: true });
  writeFileSync(out, Buffer.from(await blob.arrayBuffer()));
  console.log(`Backup written to ${out} (${blob.size} bytes).`);
} else if (command === 'restore' && file) {
  if (existsSync(config.pgliteDir) && readdirSync(config.pgliteDir).length > 0) {
    console.error(
      `${config.pgliteDir} is not empty: move it aside first (the restore never overwrites data).`,
    );
    process.exit(2);
  }
  const database = await openDatabase({ ...config, loadDataDir: new Blob([readFileSync(file)]) });
  await database.close();
  console.log(`Restored ${file} into ${config.pgliteDir}.`);
} else {
  console.error('usage: backup-cli.ts backup [out.tar.gz] | restore <in.tar.gz>');
  process.exit(2);
}
