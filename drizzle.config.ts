/**
 * drizzle-kit configuration: `npx drizzle-kit generate` writes db/migrations from
 * src/catalog/schema.ts. The committed migrations are applied at open by
 * src/catalog/migrate.ts; test/catalog/migrations.test.ts regenerates them into a
 * temporary folder and fails if anything would change.
 */
import { defineConfig } from 'drizzle-kit';

export default defineConfig({
  dialect: 'sqlite',
  schema: './src/catalog/schema.ts',
  out: './db/migrations',
});
