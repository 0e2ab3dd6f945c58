// The whole Drizzle schema: one file per group of tables under db/tables/, re-exported here
// so that drizzle-kit and the client see one schema object.
export * from './tables/users';
export * from './tables/labs';
export * from './tables/auth-tokens';
export * from './tables/invitations';
export * from './tables/rate-limits';
export * from './tables/audit';
export * from './tables/dev-mail';
export * from './tables/memos';
export * from './tables/runs';
export * from './tables/datasets';
