// drizzle-kit configuration: schema in src/db/schema, SQL migrations in the top-level drizzle/ folder.
import { defineConfig } from 'drizzle-kit';

export default defineConfig({
  dialect: 'postgresql',
  driver: 'pglite',
  schema: './apps/server/src/db/schema/*.ts',
  out: './drizzle',
});
