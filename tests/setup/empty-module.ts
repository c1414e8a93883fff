// Stands in for the `server-only` marker under vitest, which runs db/ code outside Next's server bundle.
export {};
