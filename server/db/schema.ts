/**
 * Every table of the application, gathered for Drizzle and drizzle-kit.
 * Each module owns its tables in `server/<module>/<module>.schema.ts`.
 */
export * from '../audit/audit.schema';
export * from '../sites/sites.schema';
export * from '../batteries/batteries.schema';
export * from '../profiles/profiles.schema';
export * from '../users/users.schema';
export * from '../auth/auth.schema';
export * from '../mail/mail.schema';
export * from '../jobs/jobs.schema';
export * from '../plans/plans.schema';
export * from '../studies/studies.schema';
export * from '../sign-off/sign-off.schema';
export * from '../tokens/tokens.schema';
export * from '../idempotency/idempotency.schema';
