import { describe, expect, it, vi } from "vitest";
import { randomUUID } from "node:crypto";
import sharp from "sharp";

// Sent mail stays in the outbox: this file checks the documents, not the delivery.
vi.mock("@/server/mail/outbox", async (original) => ({ ...(await original<Record<string, unknown>>()), sendAfterCommit: vi.fn() }));

import { GET as logoRoute, POST as uploadLogoRoute } from "@/app/api/settings/logo/route";
import { GET as recordPdfRoute } from "@/app/api/jobs/[jobId]/record/pdf/route";
import { GET as invoicePdfRoute } from "@/app/api/invoices/[invoiceId]/pdf/route";
import { GET as publicLogoRoute } from "@/app/records/[token]/logo/route";
import { removeLogoAction } from "@/app/(shop)/settings/record/actions";
import { createInvoiceDraft } from "@/server/billing/invoices";
import { pdfImages } from "@/server/pdf/pdf-text";
import { getRecordSettings } from "@/server/records/settings";
import { LOGO_MAX_BYTES, LOGO_MAX_SIDE_PX, LOGO_STORED_SIDE_PX } from "@/shared/records/logo";
import { asUser, callAction, makeRequest } from "../support/session";
import { createShopWithMembers } from "../support/fixtures";
import { formRequest, routeContext } from "./jobs-support";
import { createPassedJob } from "./records-fixtures";

const picture = (width: number, height: number, format: "png" | "jpeg" = "png") =>
  sharp({ create: { width, height, channels: 3, background: { r: 40, g: 80, b: 120 } } })[format]().toBuffer();

async function upload(cookieHeader: string, name: string, bytes: Uint8Array) {
  const res = await uploadLogoRoute(formRequest("/api/settings/logo", cookieHeader, { file: new File([new Uint8Array(bytes)], name) }), routeContext({}));
  return { status: res.status, body: (await res.json()) as { message?: string; fieldErrors?: Record<string, string[]> } };
}

describe("the shop's logo", () => {
  it("is kept scaled down, shown in the record and invoice PDFs, replaced and removed", async () => {
    const shop = await createShopWithMembers("logo-ok");
    const job = await createPassedJob(shop);
    const owner = await asUser(shop.actors.owner);
    expect((await upload(owner.cookieHeader, "Shop sign.png", await picture(1200, 800))).status).toBe(201);
    const stored = await logoRoute(makeRequest("/api/settings/logo"), routeContext({}));
    expect(stored.headers.get("content-type")).toBe("image/png");
    const meta = await sharp(Buffer.from(await stored.arrayBuffer())).metadata();
    expect([meta.width, meta.height]).toEqual([LOGO_STORED_SIDE_PX, 400]);

    await asUser(shop.actors.machinist);
    const record = await recordPdfRoute(makeRequest(`/api/jobs/${job.job.jobId}/record/pdf?units=metric`), routeContext({ jobId: job.job.jobId }));
    expect(await pdfImages(new Uint8Array(await record.arrayBuffer()))).toEqual([{ width: LOGO_STORED_SIDE_PX, height: 400 }]);
    const { id } = await createInvoiceDraft({ actor: shop.actors.machinist, input: { id: randomUUID(), jobId: job.job.jobId, lines: [{ description: "Gasket set (demo part)", quantity: "1", unitPrice: "12.99", taxRate: "0" }] } });
    const invoice = await invoicePdfRoute(makeRequest(`/api/invoices/${id}/pdf`), routeContext({ invoiceId: id }));
    expect(await pdfImages(new Uint8Array(await invoice.arrayBuffer()))).toHaveLength(1);

    await asUser(shop.actors.owner);
    const before = (await getRecordSettings({ actor: shop.actors.owner })).logoVersion;
    expect((await upload(owner.cookieHeader, "smaller.jpg", await picture(300, 300, "jpeg"))).status).toBe(201);
    const replaced = await getRecordSettings({ actor: shop.actors.owner });
    expect(replaced.hasLogo).toBe(true);
    expect(replaced.logoVersion).not.toBe(before);
    expect((await logoRoute(makeRequest("/api/settings/logo"), routeContext({}))).headers.get("content-type")).toBe("image/jpeg");

    expect((await callAction(removeLogoAction, {})).ok).toBe(true);
    expect((await getRecordSettings({ actor: shop.actors.owner })).hasLogo).toBe(false);
    expect((await logoRoute(makeRequest("/api/settings/logo"), routeContext({}))).status).toBe(404);
    await asUser(shop.actors.machinist);
    const without = await recordPdfRoute(makeRequest(`/api/jobs/${job.job.jobId}/record/pdf?units=metric`), routeContext({ jobId: job.job.jobId }));
    expect(await pdfImages(new Uint8Array(await without.arrayBuffer()))).toEqual([]);
  });

  it("refuses another type, a disguised file, a too-big file, too many pixels, and every role but the owner", async () => {
    const shop = await createShopWithMembers("logo-refused");
    const owner = await asUser(shop.actors.owner);
    const pdf = Buffer.from("%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n");
    const refused = [
      await upload(owner.cookieHeader, "logo.pdf", pdf),
      await upload(owner.cookieHeader, "logo.png", pdf),
      await upload(owner.cookieHeader, "logo.svg", Buffer.from("<svg xmlns='http://www.w3.org/2000/svg'/>")),
      await upload(owner.cookieHeader, "logo.png", Buffer.concat([await picture(10, 10), Buffer.alloc(LOGO_MAX_BYTES)])),
      await upload(owner.cookieHeader, "logo.png", await picture(LOGO_MAX_SIDE_PX + 1, 10)),
    ];
    expect(refused.map((r) => r.status)).toEqual([400, 400, 400, 413, 400]);
    expect(refused[1]!.body.fieldErrors?.file?.[0]).toMatch(/named \.png but its content is a PDF/);
    expect(refused[4]!.body.fieldErrors?.file?.[0]).toMatch(new RegExp(`at most ${LOGO_MAX_SIDE_PX} pixels`));
    expect((await getRecordSettings({ actor: shop.actors.owner })).hasLogo).toBe(false);

    for (const role of ["lead", "machinist", "apprentice"] as const) {
      const session = await asUser(shop.actors[role]);
      expect((await upload(session.cookieHeader, "logo.png", await picture(50, 50))).status).toBe(403);
      expect((await callAction(removeLogoAction, {})).ok).toBe(false);
    }
    expect((await getRecordSettings({ actor: shop.actors.owner })).hasLogo).toBe(false);
  });

  it("is served to the customer's link only while the link is live", async () => {
    const token = "0".repeat(40);
    expect((await publicLogoRoute(makeRequest(`/records/${token}/logo`), routeContext({ token }))).status).toBe(404);
  });
});
