import { defineConfig } from 'drizzle-kit';

// `npm run db:generate` writes a new SQL migration into drizzle/ after a change to the schema.
export default defineConfig({
  dialect: 'sqlite',
  schema: './server/db/schema.ts',
  out: './drizzle',
});
