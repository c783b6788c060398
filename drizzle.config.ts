import { defineConfig } from 'drizzle-kit';

// Migrations are generated into drizzle/ (committed, never hand-edited) and applied by the server at start,
// on embedded PGlite by default or on a PostgreSQL server when DATABASE_URL is set.
export default defineConfig({
  dialect: 'postgresql',
  driver: 'pglite',
  schema: './server/db/schema/index.ts',
  out: './drizzle',
  dbCredentials: { url: process.env.PGLITE_DIR ?? 'data/local/pglite' },
});
