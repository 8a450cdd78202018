import { defineConfig } from 'drizzle-kit';

// `npm run db:generate` writes SQL migrations into drizzle/ from the schema; review and commit them.
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema/index.ts',
  out: './drizzle',
  casing: 'snake_case',
  dbCredentials: { url: process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5544/seamwright' },
});
