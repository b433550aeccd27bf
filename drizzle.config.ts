import { defineConfig } from 'drizzle-kit';

// `npm run db:generate` writes SQL migrations from the schema; no database is needed for that.
// The server applies them in-process at start (server/db/client.ts).
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema/index.ts',
  out: './server/db/migrations',
});
