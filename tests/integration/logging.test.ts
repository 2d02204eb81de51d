// Issue 15 §4: a logged query error carries its code, never the query's parameters.
import { Writable } from "node:stream";
import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { db } from "@/server/db";
import { users } from "@/server/db/schema";
import { createLogger, logError, safeErrorFields } from "@/server/log";

function capture() {
  const lines: string[] = [];
  const stream = new Writable({ write(chunk, _enc, done) { lines.push(String(chunk)); done(); } });
  return { logger: createLogger(stream), lines };
}

describe("log policy", () => {
  it("logs a failed query by code only: no parameter, hash or token reaches the log", async () => {
    const id = randomUUID();
    const secretHash = `$argon2id$v=19$m=19456,t=2,p=1$${"c2VjcmV0c2FsdA"}$${"aGFzaGhhc2hoYXNo"}`;
    const secretEmail = `reset-${randomUUID()}@example.test`;
    await db.insert(users).values({ id, email: secretEmail, name: "Logged", passwordHash: secretHash });
    let failure: unknown;
    try {
      await db.insert(users).values({ id, email: secretEmail, name: "Logged again", passwordHash: secretHash });
    } catch (error) {
      failure = error;
    }
    expect(String((failure as Error).message)).toContain(secretEmail); // the driver's own message does quote it
    const { logger, lines } = capture();
    logError("test.query_failed", failure, logger);
    logger.flush();
    const text = lines.join("");
    const entry = JSON.parse(lines[0]!);
    expect(entry).toMatchObject({ level: 50, event: "test.query_failed", err: { kind: "database", code: "ER_DUP_ENTRY", errno: 1062 } });
    for (const secret of [secretEmail, secretHash, id, "insert into", "params"]) expect(text.toLowerCase()).not.toContain(secret.toLowerCase());
  });

  it("cuts what follows a quoted query and long hex (tokens) from other errors' messages", () => {
    expect(safeErrorFields(new Error("Failed query: select 1 params: abc"))).toEqual({ kind: "Error", message: "Failed query: [omitted]" });
    expect(safeErrorFields(new Error(`bad token ${"ab".repeat(20)}`)).message).toBe("bad token [hex omitted]");
  });
});
