// Matrix rows for issue 5 (jobs, readings, pistons, customers, CSV import, attachments).
import { readFileSync } from "node:fs";
import * as jobsRoute from "@/app/api/jobs/route";
import * as jobRoute from "@/app/api/jobs/[jobId]/route";
import * as readingsRoute from "@/app/api/jobs/[jobId]/readings/route";
import * as importRoute from "@/app/api/jobs/[jobId]/readings/import/route";
import * as uploadRoute from "@/app/api/jobs/[jobId]/attachments/route";
import * as fileRoute from "@/app/api/attachments/[attachmentId]/route";
import * as customersRoute from "@/app/api/customers/route";
import * as customerRoute from "@/app/api/customers/[customerId]/route";
import {
  assignCylinderAction, createJobAction, createPistonAction, createReadingSetAction, deleteAttachmentAction, deletePistonAction, deleteReadingSetAction,
  setJobArchivedAction, setJobStatusAction, updateJobAction, updatePistonAction,
} from "@/app/(shop)/jobs/actions";
import { createCustomerAction, setCustomerArchivedAction, updateCustomerAction } from "@/app/(shop)/customers/actions";
import { createCustomer } from "@/server/customers/mutations";
import { assignCylinder } from "@/server/jobs/mutations";
import { createPiston } from "@/server/pistons/mutations";
import { createReadingSet } from "@/server/readings/mutations";
import { uploadAttachment } from "@/server/uploads/mutations";
import type { MatrixCase, MatrixContext, Outcome } from "../matrix";
import { actionOutcome, routeOutcome } from "../matrix";

const asActionOutcome = (result: { ok: boolean; message?: string }) => actionOutcome(result) as Outcome;
import { makeRequest } from "../session";
import { formRequest, jobInput, levels, makeJob } from "../../integration/jobs-support";

const MACHINIST_UP: MatrixCase["allowed"] = ["owner", "lead", "machinist"];
const EVERYONE: MatrixCase["allowed"] = ["owner", "lead", "machinist", "apprentice"];
const params = <P>(p: P) => ({ params: Promise.resolve(p) });
const send = (path: string, method: string, body?: unknown) => makeRequest(path, { method, body });
const photo = () => new Uint8Array(readFileSync(new URL("../../fixtures/uploads/bore-photo.png", import.meta.url)));
const csv = () => readFileSync(new URL("../../fixtures/uploads/gauge-cylinder-2.csv", import.meta.url), "utf8");
const cookie = () => makeRequest("/").headers.get("cookie") ?? "";
const piston = { label: "1", diameterUm: 91_950, sizingHeightUm: 12_000, type: "cast", clearanceMinUm: 30, clearanceMaxUm: 50 };

/** A fresh two-cylinder job of the target shop; cylinder 2 is assigned to the shop's apprentice. */
async function target({ shop }: MatrixContext) {
  const { jobId, cylinderIds } = await makeJob(shop.actors.owner, { cylinderCount: 2 });
  await assignCylinder({ actor: shop.actors.owner, jobId, cylinderId: cylinderIds[1]!, userId: shop.actors.apprentice.userId });
  return { jobId, cylinderId: cylinderIds[0]!, assignedCylinderId: cylinderIds[1]! };
}

export const jobsMatrixCases: MatrixCase[] = [
  { name: "GET /api/jobs", allowed: EVERYONE, otherShop: "allowed", call: async () => routeOutcome(await jobsRoute.GET(makeRequest("/api/jobs?status=all"), params({}))) },
  { name: "action jobs.create", allowed: MACHINIST_UP, otherShop: "allowed", call: async () => asActionOutcome(await createJobAction(null, { input: jobInput({ cylinderCount: 1 }) })) },
  { name: "GET /api/jobs/[jobId]", allowed: EVERYONE, otherShop: 404, call: async (c) => { const t = await target(c); return routeOutcome(await jobRoute.GET(makeRequest(`/api/jobs/${t.jobId}`), params({ jobId: t.jobId }))); } },
  { name: "action jobs.update", allowed: MACHINIST_UP, otherShop: 404, call: async (c) => { const t = await target(c); return asActionOutcome(await updateJobAction(null, { jobId: t.jobId, input: jobInput() })); } },
  { name: "action jobs.setStatus", allowed: MACHINIST_UP, otherShop: 404, call: async (c) => { const t = await target(c); return asActionOutcome(await setJobStatusAction(null, { jobId: t.jobId, input: { status: "in_work" } })); } },
  { name: "action jobs.setArchived", allowed: MACHINIST_UP, otherShop: 404, call: async (c) => { const t = await target(c); return asActionOutcome(await setJobArchivedAction(null, { jobId: t.jobId, archived: true })); } },
  {
    name: "action jobs.assignCylinder", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => { const t = await target(c); return asActionOutcome(await assignCylinderAction(null, { jobId: t.jobId, cylinderId: t.cylinderId, assignedUserId: null })); },
  },
  {
    name: "POST /api/jobs/[jobId]/readings (as received)", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => { const t = await target(c); return routeOutcome(await readingsRoute.POST(send(`/api/jobs/${t.jobId}/readings`, "POST", { cylinderId: t.cylinderId, kind: "as_received", levels: levels(92_010) }), params({ jobId: t.jobId }))); },
  },
  {
    name: "POST /api/jobs/[jobId]/readings (final, cylinder assigned to the apprentice)", allowed: EVERYONE, otherShop: 404,
    call: async (c) => { const t = await target(c); return routeOutcome(await readingsRoute.POST(send(`/api/jobs/${t.jobId}/readings`, "POST", { cylinderId: t.assignedCylinderId, kind: "final", levels: levels(92_250) }), params({ jobId: t.jobId }))); },
  },
  {
    name: "POST /api/jobs/[jobId]/readings (checkpoint, unassigned cylinder)", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => { const t = await target(c); return routeOutcome(await readingsRoute.POST(send(`/api/jobs/${t.jobId}/readings`, "POST", { cylinderId: t.cylinderId, kind: "checkpoint", levels: levels(92_200) }), params({ jobId: t.jobId }))); },
  },
  {
    name: "action readings.create (final, cylinder assigned to the apprentice)", allowed: EVERYONE, otherShop: 404,
    call: async (c) => { const t = await target(c); return asActionOutcome(await createReadingSetAction(null, { jobId: t.jobId, input: { cylinderId: t.assignedCylinderId, kind: "final", levels: levels(92_250) } })); },
  },
  {
    name: "action readings.create (checkpoint, unassigned cylinder)", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => { const t = await target(c); return asActionOutcome(await createReadingSetAction(null, { jobId: t.jobId, input: { cylinderId: t.cylinderId, kind: "checkpoint", levels: levels(92_200) } })); },
  },
  {
    name: "action readings.delete", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => {
      const t = await target(c);
      const { id } = await createReadingSet({ actor: c.shop.actors.owner, jobId: t.jobId, input: { cylinderId: t.cylinderId, kind: "as_received", levels: levels(92_000) } });
      return asActionOutcome(await deleteReadingSetAction(null, { jobId: t.jobId, readingSetId: id }));
    },
  },
  {
    name: "POST /api/jobs/[jobId]/readings/import", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => {
      const t = await target(c);
      const req = formRequest(`/api/jobs/${t.jobId}/readings/import`, cookie(), { file: new File([csv()], "gauge.csv"), mode: "commit" });
      return routeOutcome(await importRoute.POST(req, params({ jobId: t.jobId })));
    },
  },
  { name: "action pistons.create", allowed: MACHINIST_UP, otherShop: 404, call: async (c) => { const t = await target(c); return asActionOutcome(await createPistonAction(null, { jobId: t.jobId, input: piston })); } },
  {
    name: "action pistons.update", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => {
      const t = await target(c);
      const { id } = await createPiston({ actor: c.shop.actors.owner, jobId: t.jobId, input: piston });
      return asActionOutcome(await updatePistonAction(null, { jobId: t.jobId, pistonId: id, input: { ...piston, label: "2" } }));
    },
  },
  {
    name: "action pistons.delete", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => {
      const t = await target(c);
      const { id } = await createPiston({ actor: c.shop.actors.owner, jobId: t.jobId, input: piston });
      return asActionOutcome(await deletePistonAction(null, { jobId: t.jobId, pistonId: id }));
    },
  },
  {
    name: "POST /api/jobs/[jobId]/attachments", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => {
      const t = await target(c);
      return routeOutcome(await uploadRoute.POST(formRequest(`/api/jobs/${t.jobId}/attachments`, cookie(), { file: new File([photo()], "bore.png") }), params({ jobId: t.jobId })));
    },
  },
  {
    name: "action attachments.delete", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => {
      const t = await target(c);
      const { id } = await uploadAttachment({ actor: c.shop.actors.owner, jobId: t.jobId, file: { name: "bore.png", bytes: photo() } });
      return asActionOutcome(await deleteAttachmentAction(null, { jobId: t.jobId, attachmentId: id }));
    },
  },
  {
    name: "GET /api/attachments/[attachmentId]", allowed: EVERYONE, otherShop: 404,
    call: async (c) => {
      const t = await target(c);
      const { id } = await uploadAttachment({ actor: c.shop.actors.owner, jobId: t.jobId, file: { name: "bore.png", bytes: photo() } });
      return routeOutcome(await fileRoute.GET(makeRequest(`/api/attachments/${id}`), params({ attachmentId: id })));
    },
  },
  { name: "GET /api/customers", allowed: EVERYONE, otherShop: "allowed", call: async () => routeOutcome(await customersRoute.GET(makeRequest("/api/customers"), params({}))) },
  { name: "action customers.create", allowed: MACHINIST_UP, otherShop: "allowed", call: async () => asActionOutcome(await createCustomerAction(null, { name: "Matrix customer (test)" })) },
  {
    name: "GET /api/customers/[customerId]", allowed: EVERYONE, otherShop: 404,
    call: async (c) => { const { id } = await createCustomer({ actor: c.shop.actors.owner, input: { name: "Matrix (test)" } }); return routeOutcome(await customerRoute.GET(makeRequest(`/api/customers/${id}`), params({ customerId: id }))); },
  },
  {
    name: "action customers.update", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => { const { id } = await createCustomer({ actor: c.shop.actors.owner, input: { name: "Matrix (test)" } }); return asActionOutcome(await updateCustomerAction(null, { customerId: id, name: "Renamed (test)" })); },
  },
  {
    name: "action customers.setArchived", allowed: MACHINIST_UP, otherShop: 404,
    call: async (c) => { const { id } = await createCustomer({ actor: c.shop.actors.owner, input: { name: "Matrix (test)" } }); return asActionOutcome(await setCustomerArchivedAction(null, { customerId: id, archived: true })); },
  },
];
