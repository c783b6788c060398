// `npm run db:seed`: seeds the demo into the configured database (stop the server first when on PGlite:
// only one process may open its data folder). Safe to run twice.
import { createAuth } from '../auth/auth';
import { loadConfig } from '../config';
import { openDatabase } from './client';
import { seedDemo } from './seed';

const config = loadConfig();
const database = await openDatabase(config);
const auth = createAuth(database, config, { send: async () => {} });
const seeded = await seedDemo(database.db, auth);
console.log(seeded ? 'Demo scenario seeded.' : 'Demo scenario already present; nothing changed.');
await database.close();
