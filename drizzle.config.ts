import { defineConfig } from 'drizzle-kit';

// Migrations are generated from the TypeScript schema and committed with their journal.
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema.ts',
  out: './drizzle',
  dbCredentials: { url: process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:54329/slackwater' },
});
