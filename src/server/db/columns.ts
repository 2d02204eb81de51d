import "server-only";
import { datetime, decimal } from "drizzle-orm/mysql-core";

// One length convention for the whole schema: DECIMAL micrometres with 0.1 µm resolution, in
// columns whose names end in _um (DESIGN.md §6).
export function micrometres(name: string) {
  return decimal(name, { precision: 10, scale: 1, mode: "number" });
}

/** DATETIME(3) read as a Date; the server and the connection both run in UTC. */
export function timestamp(name: string) {
  return datetime(name, { mode: "date", fsp: 3 });
}
