// Every table, one per file; drizzle.config.ts points here.
export * from './studios';
