// Stands in for "server-only" under vitest: the real package throws outside
// a React Server Components bundle, and tests import server modules directly.
export {};
