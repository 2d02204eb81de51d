export * from "./errors";
export * from "./money";
export * from "./totals";
export * from "./time";
