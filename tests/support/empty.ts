// Stands in for the "server-only" package under vitest, so data-access code that imports it can be
// tested in Node (Next's bundler is what enforces the server/client boundary).
export {};
