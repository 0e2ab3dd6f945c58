// The whole Drizzle schema: one file per group of tables under db/tables/, re-exported here
// so that drizzle-kit and the client see one schema object.
export * from './tables/users';
export * from './tables/labs';
