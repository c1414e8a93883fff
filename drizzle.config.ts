import { defineConfig } from "drizzle-kit";

/** Migrations are generated from db/schema.ts into drizzle/ and committed; `npm start` and the tests apply them. */
export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema.ts",
  out: "./drizzle",
  dbCredentials: { url: process.env.DATABASE_URL ?? "postgres://app@127.0.0.1:54329/backplate" },
  strict: true,
});
