// Shared pieces of the bad-input fuzz tests (issue 18 §2): shop-scoped fingerprints of every table,
// arbitrary bodies built from the field names the shared schemas use, and the other shop's markers.
import fc from "fast-check";
import { z } from "zod";
import { sql } from "drizzle-orm";
import { db } from "@/server/db";
import { env } from "@/env";

/** Tables of one shop (a `shop_id` column), plus the shop row and its members' user rows. */
export async function shopFingerprint(shopIds: string[], userIds: string[]): Promise<string> {
  const statement = await fingerprintStatement();
  const [rows] = (await db.execute(sql.raw(statement(shopIds, userIds)))) as unknown as [Array<{ t: string; n: number; c: string | null }>];
  return rows.map((r) => `${r.t}:${r.n}:${r.c}`).join(" ");
}

let cached: ((shopIds: string[], userIds: string[]) => string) | null = null;
async function fingerprintStatement() {
  if (cached) return cached;
  const [cols] = (await db.execute(sql`SELECT table_name AS t, column_name AS c FROM information_schema.columns WHERE table_schema = ${env.DB_NAME} ORDER BY table_name, ordinal_position`)) as unknown as [Array<{ t: string; c: string }>];
  const byTable = new Map<string, string[]>();
  for (const { t, c } of cols) byTable.set(t, [...(byTable.get(t) ?? []), c]);
  const quote = (v: string) => `'${v.replace(/[^0-9a-zA-Z-]/g, "")}'`;
  cached = (shopIds, userIds) => {
    const parts: string[] = [];
    for (const [table, columns] of byTable) {
      const filter = columns.includes("shop_id") ? `shop_id IN (${shopIds.map(quote).join(",")})`
        : table === "shops" ? `id IN (${shopIds.map(quote).join(",")})`
          : table === "users" ? `id IN (${userIds.map(quote).join(",")})` : null;
      if (!filter) continue; // sessions, rate-limit buckets, tokens: keyed by user or address, not by shop
      const row = `CONCAT_WS('|', ${columns.map((c) => `IFNULL(HEX(CAST(\`${c}\` AS CHAR)), '~')`).join(", ")})`;
      parts.push(`SELECT '${table}' AS t, COUNT(*) AS n, BIT_XOR(CRC32(${row})) AS c FROM \`${table}\` WHERE ${filter}`);
    }
    return parts.join(" UNION ALL ");
  };
  return cached;
}

/** Every object key the shared schemas name: generated bodies use them, so they reach past "unknown shape". */
export function schemaKeys(modules: Record<string, Record<string, unknown>>): string[] {
  const keys = new Set<string>();
  const visit = (schema: unknown, depth: number) => {
    if (depth > 3 || !(schema instanceof z.ZodType)) return;
    const shape = (schema as unknown as { shape?: Record<string, unknown> }).shape;
    if (shape && typeof shape === "object") for (const [key, inner] of Object.entries(shape)) { keys.add(key); visit(inner, depth + 1); }
  };
  for (const exports of Object.values(modules)) for (const value of Object.values(exports)) visit(value, 0);
  return [...keys];
}

const edgeStrings = fc.constantFrom("", " ", "0", "-1", "1e309", "NaN", "null", "true", "[]", "{}", "93.92 mm", "2.8 thou", "'; DROP TABLE jobs; --", "<script>x</script>", "\u0000", "../../etc/passwd", "9".repeat(400), "ü✓🔧");
const scalar = fc.oneof(fc.string({ maxLength: 30 }), edgeStrings, fc.integer(), fc.double(), fc.boolean(), fc.constant(null));

export function bodyArbitrary(keys: string[], ids: string[]) {
  const key = fc.oneof({ weight: 4, arbitrary: fc.constantFrom(...keys) }, { weight: 1, arbitrary: fc.string({ maxLength: 10 }) });
  const value = fc.oneof({ weight: 3, arbitrary: scalar }, { weight: 2, arbitrary: fc.constantFrom(...ids) }, { weight: 1, arbitrary: fc.array(scalar, { maxLength: 4 }) }, { weight: 1, arbitrary: fc.dictionary(key, scalar, { maxKeys: 4 }) });
  const object = fc.dictionary(key, value, { maxKeys: 10 });
  return {
    json: fc.oneof({ weight: 5, arbitrary: object }, { weight: 1, arbitrary: fc.json({ maxDepth: 3 }).map((t) => JSON.parse(t) as unknown) }, { weight: 1, arbitrary: fc.array(value, { maxLength: 3 }) }),
    form: fc.dictionary(key, fc.oneof(fc.string({ maxLength: 30 }), edgeStrings, fc.constantFrom(...ids)), { maxKeys: 10 }),
    raw: fc.oneof(fc.string({ maxLength: 200 }), fc.constantFrom("{", "[1,", "\"x\"", "null", "{\"__proto__\":{\"admin\":true}}", "%7B%7D", "a=1&b=2")),
    query: fc.dictionary(key, fc.oneof(fc.string({ maxLength: 20 }), edgeStrings, fc.constantFrom(...ids)), { maxKeys: 4 }),
    id: fc.oneof({ weight: 3, arbitrary: fc.constantFrom(...ids) }, { weight: 1, arbitrary: fc.uuid() }, { weight: 1, arbitrary: fc.oneof(fc.string({ maxLength: 40 }), edgeStrings) }),
  };
}

/** Ids of a shop's rows in every table that has an `id` and a `shop_id` (a few per table). */
export async function shopRowIds(shopId: string): Promise<string[]> {
  const [cols] = (await db.execute(sql`SELECT table_name AS t FROM information_schema.columns WHERE table_schema = ${env.DB_NAME} AND column_name = 'shop_id' AND table_name IN (SELECT table_name FROM information_schema.columns WHERE table_schema = ${env.DB_NAME} AND column_name = 'id')`)) as unknown as [Array<{ t: string }>];
  const ids: string[] = [shopId];
  for (const { t } of cols) {
    const [rows] = (await db.execute(sql.raw(`SELECT id FROM \`${t}\` WHERE shop_id = '${shopId.replace(/[^0-9a-f-]/g, "")}' LIMIT 3`))) as unknown as [Array<{ id: string }>];
    ids.push(...rows.map((r) => String(r.id)));
  }
  return ids;
}
