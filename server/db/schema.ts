/**
 * Every table of the application, gathered for Drizzle and drizzle-kit.
 * Each module owns its tables in `server/<module>/<module>.schema.ts`.
 */
export * from '../audit/audit.schema';
