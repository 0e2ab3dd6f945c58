// Stands in for the `server-only` marker package under vitest, which runs outside
// the React Server Components bundler that normally resolves it.
export {};
