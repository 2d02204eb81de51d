import "server-only";
import { randomUUID } from "node:crypto";

/** Ids are made by the app (MariaDB has no RETURNING), so a row's id is known before it is written. */
export function newId(): string {
  return randomUUID();
}
