import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import sharp from "sharp";
import { createShopWithMembers } from "../support/fixtures";
import { asUser, makeRequest } from "../support/session";
import { POST as uploadRoute } from "@/app/api/jobs/[jobId]/attachments/route";
import { GET as fileRoute } from "@/app/api/attachments/[attachmentId]/route";
import { GET as thumbRoute } from "@/app/api/attachments/[attachmentId]/thumbnail/route";
import { env } from "@/env";
import { getJobDetail } from "@/server/jobs/detail";
import { formRequest, makeJob, routeContext } from "./jobs-support";

const fixture = (name: string) => readFileSync(new URL(`../fixtures/uploads/${name}`, import.meta.url));

async function setUp(label: string) {
  const shop = await createShopWithMembers(label);
  const { jobId, cylinderIds } = await makeJob(shop.actors.machinist, { cylinderCount: 2 });
  const session = await asUser(shop.actors.machinist);
  const upload = (name: string, body: Buffer | string, extra: Record<string, string> = {}, init = {}) =>
    uploadRoute(formRequest(`/api/jobs/${jobId}/attachments`, session.cookieHeader, { file: new File([typeof body === "string" ? body : new Uint8Array(body)], name), ...extra }, init), routeContext({ jobId }));
  const count = async () => (await getJobDetail({ actor: shop.actors.machinist, jobId })).attachments.length;
  return { shop, jobId, cylinderIds, upload, count };
}

describe("attachments through the route", () => {
  it("stores a photo re-encoded with a thumbnail, and serves it only to the shop", async () => {
    const { shop, cylinderIds, upload, count } = await setUp("up-photo");
    // Trailing bytes after the image end are dropped by re-encoding.
    const withPayload = Buffer.concat([fixture("bore-photo.png"), Buffer.from("<script>alert(1)</script>")]);
    const res = await upload("Bore 3 photo.png", withPayload, { cylinderId: cylinderIds[1]! });
    expect(res.status).toBe(201);
    const { id, kind } = await res.json();
    expect(kind).toBe("photo");
    expect(await count()).toBe(1);
    const file = await fileRoute(makeRequest(`/api/attachments/${id}`), routeContext({ attachmentId: id }));
    expect(file.status).toBe(200);
    expect(file.headers.get("content-type")).toBe("image/png");
    expect(file.headers.get("x-content-type-options")).toBe("nosniff");
    expect(file.headers.get("content-disposition")).toMatch(/^inline; filename="photo-[0-9a-f]{8}\.png"$/);
    const bytes = Buffer.from(await file.arrayBuffer());
    expect(bytes.includes(Buffer.from("<script>"))).toBe(false);
    expect((await sharp(bytes).metadata()).width).toBe(320);
    const thumb = await thumbRoute(makeRequest(`/api/attachments/${id}/thumbnail`), routeContext({ attachmentId: id }));
    expect(thumb.headers.get("content-type")).toBe("image/webp");
    const other = await createShopWithMembers("up-photo-o");
    await asUser(other.actors.owner);
    expect((await fileRoute(makeRequest(`/api/attachments/${id}`), routeContext({ attachmentId: id }))).status).toBe(404);
    await asUser(shop.actors.apprentice);
    expect((await fileRoute(makeRequest(`/api/attachments/${id}`), routeContext({ attachmentId: id }))).status).toBe(200);
  });

  it("accepts a PDF report and a CSV gauge file, served as downloads", async () => {
    const { upload } = await setUp("up-docs");
    const pdf = await upload("finish report.pdf", fixture("surface-report.pdf"));
    expect(pdf.status).toBe(201);
    const { id } = await pdf.json();
    const served = await fileRoute(makeRequest(`/api/attachments/${id}`), routeContext({ attachmentId: id }));
    expect(served.headers.get("content-disposition")).toMatch(/^attachment; filename="report-[0-9a-f]{8}\.pdf"$/);
    expect((await upload("gauge.csv", fixture("gauge-cylinder-2.csv"))).status).toBe(201);
  });

  it("refuses a PNG renamed .pdf, an SVG with script, an oversize file and a path-traversal name", async () => {
    const { upload, count } = await setUp("up-refuse");
    const cases: Array<[string, Buffer | string, RegExp]> = [
      ["report.pdf", fixture("bore-photo.png"), /named \.pdf but its content is a PNG image/],
      ["drawing.svg", fixture("drawing-with-script.svg"), /SVG files are not accepted: they can carry scripts/],
      ["drawing.png", fixture("drawing-with-script.svg"), /named \.png but its content is an SVG drawing/],
      ["../../etc/cron.d/x.png", fixture("bore-photo.png"), /folder path or "\.\."/],
      ["..\\..\\boot.png", fixture("bore-photo.png"), /folder path or "\.\."/],
      ["script.php", "<?php echo 1; ?>", /\.php files are not accepted/],
      ["big.png", Buffer.alloc(env.UPLOAD_MAX_BYTES + 1, 1), /larger than the 15 MB limit/],
    ];
    for (const [name, body, reason] of cases) {
      const res = await upload(name, body);
      // Over the size limit is 413 (issue 15), every other refusal 400.
      expect(res.status, name).toBe(name === "big.png" ? 413 : 400);
      expect((await res.json()).message, name).toMatch(reason);
    }
    const declaredHuge = await upload("big.png", "x", {}, { contentLength: env.UPLOAD_MAX_BYTES * 2 });
    expect((await declaredHuge.json()).message).toMatch(/larger than the 15 MB limit/);
    expect(await count()).toBe(0);
  });

  it("refuses an apprentice (403), a signed-out visitor (401) and another shop's job (404)", async () => {
    const { shop, jobId } = await setUp("up-perm");
    const other = await createShopWithMembers("up-perm-o");
    const post = async (cookie: string) => (await uploadRoute(formRequest(`/api/jobs/${jobId}/attachments`, cookie, { file: new File([new Uint8Array(fixture("bore-photo.png"))], "p.png") }), routeContext({ jobId }))).status;
    expect(await post((await asUser(shop.actors.apprentice)).cookieHeader)).toBe(403);
    expect(await post((await asUser(other.actors.owner)).cookieHeader)).toBe(404);
  });
});
