import "server-only";
// The whole database schema. Each domain keeps its tables in tables/<domain>.ts; drizzle-kit and the
// relational query client both read this one module.
export * from "./tables/core";
export * from "./tables/auth";
export * from "./tables/jobs";
export * from "./tables/stones";
export * from "./tables/plans";
export * from "./tables/runs";
export * from "./tables/learning";
export * from "./tables/billing";
export * from "./tables/records";
