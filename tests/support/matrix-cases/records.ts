// Matrix rows for issue 14 (the machining record): send it, revoke a customer link, and the PDFs a
// member downloads; each call gets a fresh job of the target shop that passed final inspection.
import { randomUUID } from "node:crypto";
import { revokeRecordLinkAction, sendRecordAction } from "@/app/(shop)/jobs/[jobId]/record/actions";
import sharp from "sharp";
import { removeLogoAction, updateRecordSettingsAction } from "@/app/(shop)/settings/record/actions";
import * as logoRoute from "@/app/api/settings/logo/route";
import { setLogo } from "@/server/records/logo";
import * as previewRoute from "@/app/api/jobs/[jobId]/record/pdf/route";
import * as versionRoute from "@/app/api/jobs/[jobId]/records/[versionId]/pdf/route";
import { listRecordVersions } from "@/server/records/queries";
import { sendRecord } from "@/server/records/send";
import type { MatrixCase, MatrixContext, Outcome } from "../matrix";
import { actionOutcome, routeOutcome } from "../matrix";
import { makeRequest } from "../session";
import { createPassedJob } from "../../integration/records-fixtures";
import { formRequest } from "../../integration/jobs-support";

const MACHINIST_UP: MatrixCase["allowed"] = ["owner", "lead", "machinist"];
const EVERYONE: MatrixCase["allowed"] = ["owner", "lead", "machinist", "apprentice"];
const params = <P>(p: P) => ({ params: Promise.resolve(p) });
const asActionOutcome = (result: { ok: boolean; message?: string }) => actionOutcome(result) as Outcome;
const customer = () => `matrix-customer-${randomUUID().slice(0, 8)}@example.test`;

async function passedJob({ shop }: MatrixContext) {
  return (await createPassedJob(shop, 1)).job.jobId;
}

async function sentJob(c: MatrixContext) {
  const jobId = await passedJob(c);
  const sent = await sendRecord({ actor: c.shop.actors.machinist, input: { jobId, to: customer(), unitSystem: "metric", clientId: randomUUID() } });
  const [version] = await listRecordVersions({ actor: c.shop.actors.machinist, jobId });
  return { jobId, versionId: sent.versionId, linkId: version!.links[0]!.id };
}

const png = async () => new Uint8Array(await sharp({ create: { width: 64, height: 32, channels: 3, background: { r: 40, g: 80, b: 120 } } }).png().toBuffer());

/** Both shops get a logo first, so every member's GET has one to read (their own shop's). */
async function withLogos({ shop, otherShop }: MatrixContext) {
  for (const s of [shop, otherShop]) await setLogo({ actor: s.actors.owner, file: { name: "sign.png", bytes: await png() } });
}

export const recordsMatrixCases: MatrixCase[] = [
  {
    name: "GET /api/settings/logo", allowed: EVERYONE, otherShop: "allowed",
    call: async (c) => { await withLogos(c); return routeOutcome(await logoRoute.GET(makeRequest("/api/settings/logo"), params({}))); },
  },
  {
    name: "POST /api/settings/logo", allowed: ["owner"], otherShop: "allowed",
    call: async () => routeOutcome(await logoRoute.POST(formRequest("/api/settings/logo", makeRequest("/").headers.get("cookie") ?? "", { file: new File([await png()], "sign.png") }), params({}))),
  },
  { name: "action records.removeLogo", allowed: ["owner"], otherShop: "allowed", call: async (c) => { await withLogos(c); return asActionOutcome(await removeLogoAction(null, {})); } },
  {
    name: "action records.settings", allowed: ["owner"], otherShop: "allowed",
    call: async () => asActionOutcome(await updateRecordSettingsAction(null, { address: "1 Test Lane", contact: "test@example.test", remarks: "Follow the makers' run-in instructions." })),
  },
  {
    name: "action records.send", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => asActionOutcome(await sendRecordAction(null, { jobId: await passedJob(c), to: customer(), unitSystem: "metric", clientId: randomUUID() })),
  },
  {
    name: "action records.revokeLink", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => { const t = await sentJob(c); return asActionOutcome(await revokeRecordLinkAction(null, { jobId: t.jobId, linkId: t.linkId })); },
  },
  {
    name: "GET /api/jobs/[jobId]/record/pdf", allowed: EVERYONE, otherShop: 404,
    call: async (c) => { const jobId = await passedJob(c); return routeOutcome(await previewRoute.GET(makeRequest(`/api/jobs/${jobId}/record/pdf?units=inch`), params({ jobId }))); },
  },
  {
    name: "GET /api/jobs/[jobId]/records/[versionId]/pdf", allowed: EVERYONE, otherShop: 404,
    call: async (c) => { const t = await sentJob(c); return routeOutcome(await versionRoute.GET(makeRequest(`/api/jobs/${t.jobId}/records/${t.versionId}/pdf`), params({ jobId: t.jobId, versionId: t.versionId }))); },
  },
];
