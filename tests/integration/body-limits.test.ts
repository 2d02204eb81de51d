// Issue 15 §1: bodies are counted as they stream and refused at the limit; role, job and quota come first.
import { describe, expect, it } from "vitest";
import { db } from "@/server/db";
import { attachments } from "@/server/db/schema";
import { POST as previewRoute } from "@/app/api/plans/preview/route";
import { POST as uploadRoute } from "@/app/api/jobs/[jobId]/attachments/route";
import { POST as importRoute } from "@/app/api/jobs/[jobId]/readings/import/route";
import { JSON_MAX_BYTES, FORM_OVERHEAD_BYTES } from "@/server/http/body";
import { env } from "@/env";
import { newClientId } from "@/shared/client-id";
import { createShopWithMembers } from "../support/fixtures";
import { asUser } from "../support/session";
import { formRequest, makeJob, routeContext } from "./jobs-support";

const CHUNK = 64 * 1024;

/** A chunked body (no Content-Length) that would go on for `totalBytes`, counting what was pulled. */
function endlessBody(totalBytes: number, prefix = "") {
  const counter = { pulled: 0 };
  let sentPrefix = false;
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (!sentPrefix && prefix) {
        sentPrefix = true;
        controller.enqueue(new TextEncoder().encode(prefix));
        return;
      }
      if (counter.pulled >= totalBytes) return controller.close();
      counter.pulled += CHUNK;
      controller.enqueue(new Uint8Array(CHUNK).fill(0x20));
    },
  }, { highWaterMark: 0 });
  return { stream, counter };
}

function streamingRequest(path: string, cookieHeader: string, body: ReadableStream<Uint8Array>, contentType: string) {
  const headers = new Headers({ host: "127.0.0.1:3000", origin: "http://127.0.0.1:3000", cookie: cookieHeader, "content-type": contentType });
  return new Request(new URL(path, "http://127.0.0.1:3000"), { method: "POST", headers, body, duplex: "half" } as RequestInit);
}

describe("byte-counted bodies", () => {
  it("refuses a chunked JSON body over the limit with 413, having read at most the limit plus one chunk", async () => {
    const shop = await createShopWithMembers("body-json");
    const session = await asUser(shop.actors.machinist);
    const { stream, counter } = endlessBody(1024 * 1024 * 1024, '{"jobId":"');
    const res = await previewRoute(streamingRequest("/api/plans/preview", session.cookieHeader, stream, "application/json"), routeContext({}));
    expect(res.status).toBe(413);
    expect((await res.json()).message).toMatch(/larger than the 256 KB limit/);
    expect(counter.pulled).toBeLessThanOrEqual(JSON_MAX_BYTES + 2 * CHUNK);
  });

  it("refuses a chunked multipart upload over the limit with 413 without buffering it", async () => {
    const shop = await createShopWithMembers("body-form");
    const { jobId } = await makeJob(shop.actors.machinist, { cylinderCount: 2 });
    const session = await asUser(shop.actors.machinist);
    const { stream, counter } = endlessBody(1024 * 1024 * 1024, "--x\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.pdf\"\r\n\r\n");
    const res = await uploadRoute(streamingRequest(`/api/jobs/${jobId}/attachments`, session.cookieHeader, stream, "multipart/form-data; boundary=x"), routeContext({ jobId }));
    expect(res.status).toBe(413);
    expect(counter.pulled).toBeLessThanOrEqual(env.UPLOAD_MAX_BYTES + FORM_OVERHEAD_BYTES + 2 * CHUNK);
  });

  it("checks the role and the job before a byte of the body is read", async () => {
    const shop = await createShopWithMembers("body-role");
    const other = await createShopWithMembers("body-role-o");
    const { jobId } = await makeJob(shop.actors.machinist, { cylinderCount: 2 });
    const cases = [
      { actor: shop.actors.apprentice, route: uploadRoute, path: `/api/jobs/${jobId}/attachments`, status: 403 },
      { actor: other.actors.owner, route: uploadRoute, path: `/api/jobs/${jobId}/attachments`, status: 404 },
      { actor: other.actors.owner, route: importRoute, path: `/api/jobs/${jobId}/readings/import`, status: 404 },
    ];
    for (const c of cases) {
      const session = await asUser(c.actor);
      const { stream, counter } = endlessBody(1024 * 1024);
      const res = await c.route(streamingRequest(c.path, session.cookieHeader, stream, "multipart/form-data; boundary=x"), routeContext({ jobId }));
      expect(res.status).toBe(c.status);
      expect(counter.pulled).toBe(0);
    }
  });

  it("refuses uploads once the shop's storage quota is used, before reading the body", async () => {
    const shop = await createShopWithMembers("body-quota");
    const { jobId } = await makeJob(shop.actors.machinist, { cylinderCount: 2 });
    const half = Math.ceil(env.UPLOAD_SHOP_QUOTA_BYTES / 2);
    for (const n of [1, 2]) {
      await db.insert(attachments).values({
        id: newClientId(), shopId: shop.shopId, jobId, kind: "report", displayName: `old-${n}.pdf`, storedName: `missing-${n}.pdf`,
        contentType: "application/pdf", sizeBytes: half, uploadedBy: shop.actors.machinist.userId,
      });
    }
    const session = await asUser(shop.actors.machinist);
    const { stream, counter } = endlessBody(1024);
    const res = await uploadRoute(streamingRequest(`/api/jobs/${jobId}/attachments`, session.cookieHeader, stream, "multipart/form-data; boundary=x"), routeContext({ jobId }));
    expect(res.status).toBe(413);
    expect((await res.json()).message).toMatch(/storage is full/);
    expect(counter.pulled).toBe(0);
  });

  it("answers a retried upload with the same id once: one row", async () => {
    const shop = await createShopWithMembers("body-retry");
    const { jobId } = await makeJob(shop.actors.machinist, { cylinderCount: 2 });
    const session = await asUser(shop.actors.machinist);
    const clientId = newClientId();
    const send = () => uploadRoute(formRequest(`/api/jobs/${jobId}/attachments`, session.cookieHeader, { file: new File(["a,b\n1,2\n"], "gauge.csv"), clientId }), routeContext({ jobId }));
    const [a, b] = await Promise.all([send(), send()]);
    const third = await send();
    const bodies = await Promise.all([a.json(), b.json(), third.json()]);
    expect(bodies.map((x) => x.id)).toEqual([clientId, clientId, clientId]);
    const rows = await db.select().from(attachments).where((await import("drizzle-orm")).eq(attachments.jobId, jobId));
    expect(rows).toHaveLength(1);
  });
});
