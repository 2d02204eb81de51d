// Extra routes for scripts/bench-http.mjs. Each later issue adds its own, preparing a signed-in session
// and data in the bench database first.
//
// Issue 12: POST /api/floor/runs, a run of the demo floor plan retried with one device id (see below).
// Issue 7: POST /api/plans/preview for an eight-cylinder job (full reading sets and a piston on every
// cylinder) with the demo stone library, as a signed-in machinist. The data is made through the server
// functions by a tsx child process (they are TypeScript); every figure is invented for the bench.
import { execFileSync } from "node:child_process";
import { randomUUID as randomRunId } from "node:crypto";

const SETUP_SCRIPT = `
const { randomUUID } = await import("node:crypto");
const { db, pool } = await import("./src/server/db/index.ts");
const { shops, users, memberships } = await import("./src/server/db/schema.ts");
const { seedDemoStones } = await import("./src/server/demo/stones.ts");
const { createJob } = await import("./src/server/jobs/mutations.ts");
const { listCylinders } = await import("./src/server/jobs/queries.ts");
const { createReadingSet } = await import("./src/server/readings/mutations.ts");
const { createPiston } = await import("./src/server/pistons/mutations.ts");
const { listActiveMachines } = await import("./src/server/plans/library.ts");
const { createSessionFor } = await import("./src/server/auth/session.ts");
const { seedDemoFloor } = await import("./src/server/demo/floor.ts");
const { SESSION_COOKIE_NAME } = await import("./src/server/auth/cookie.ts");
const tag = randomUUID().slice(0, 8);
const shopId = randomUUID();
await db.insert(shops).values({ id: shopId, name: "Bench shop " + tag + " (invented)" });
const ids = {};
for (const role of ["lead", "machinist", "apprentice"]) {
  ids[role] = randomUUID();
  await db.insert(users).values({ id: ids[role], email: role + "-bench-" + tag + "@example.test", name: "Bench " + role, passwordHash: "!" });
  await db.insert(memberships).values({ id: randomUUID(), shopId, userId: ids[role], role });
}
await seedDemoStones({ shopId, signIns: [], userIdsByRole: ids });
const actor = { userId: ids.machinist, shopId, role: "machinist" };
const { id: jobId } = await createJob({ actor, input: { engineDescription: "V8, 5.7 L, grey-iron block (bench, invented)", boreMaterial: "grey_iron", cylinderCount: 8, standardBoreUm: 101600, boreLengthUm: 140000, bottomClearanceUm: 20000, torquePlate: false } });
for (const c of await listCylinders({ shopId, jobId })) {
  const base = 101640 + c.number * 3;
  const levels = [{ name: "top", aUm: base + 18, bUm: base + 12 }, { name: "middle", aUm: base + 8, bUm: base + 6 }, { name: "bottom", aUm: base, bUm: base + 2 }];
  await createReadingSet({ actor, jobId, input: { cylinderId: c.id, kind: "as_received", levels } });
  await createPiston({ actor, jobId, input: { cylinderId: c.id, label: String(c.number), diameterUm: 101700 + (c.number % 3), sizingHeightUm: 15000, type: "forged", clearanceMinUm: 60, clearanceMaxUm: 90 } });
}
const [machine] = await listActiveMachines({ actor });
// Issue 18: the job list of a shop with 1 000 jobs (invented engines), read as the machinist.
const { jobs: jobsTable } = await import("./src/server/db/schema.ts");
const { newId } = await import("./src/server/db/ids.ts");
const { createPlanningVersion } = await import("./src/server/plans/planning-version.ts");
const listShopId = randomUUID();
await db.insert(shops).values({ id: listShopId, name: "Bench list shop " + tag + " (invented)" });
await db.insert(memberships).values({ id: randomUUID(), shopId: listShopId, userId: ids.machinist, role: "machinist" });
await createPlanningVersion(db, listShopId);
for (let start = 0; start < 1000; start += 200) {
  await db.insert(jobsTable).values(Array.from({ length: 200 }, (_, i) => ({
    id: newId(), shopId: listShopId, number: start + i + 1, engineDescription: "Bench engine " + (start + i + 1) + " (invented)", boreMaterial: "grey_iron",
    cylinderCount: 4, standardBoreUm: 92000, boreLengthUm: 130000, torquePlate: false, status: "received", createdBy: ids.machinist,
  })));
}
const listSession = await createSessionFor(ids.machinist, { activeShopId: listShopId, userAgent: "bench" });
const { token } = await createSessionFor(ids.machinist, { activeShopId: shopId, userAgent: "bench" });
const { planId } = await seedDemoFloor({ shopId, signIns: [], userIdsByRole: ids });
const floor = await createSessionFor(ids.apprentice, { activeShopId: shopId, userAgent: "bench" });
console.log(JSON.stringify({ jobId, machineId: machine.id, cookie: SESSION_COOKIE_NAME + "=" + token, planId, floorCookie: SESSION_COOKIE_NAME + "=" + floor.token, listCookie: SESSION_COOKIE_NAME + "=" + listSession.token }));
await pool.end();
`;

/** The plan preview target: a signed-in machinist's cookie, our own Origin and an eight-cylinder body. */
export async function prepareTargets(base) {
  const out = execFileSync("npx", ["tsx", "--conditions=react-server", "-e", `(async () => {${SETUP_SCRIPT}})()`], {
    env: { ...process.env, DB_NAME: process.env.DB_NAME ?? "borewise_test", APP_URL: base, NODE_ENV: "production" },
    encoding: "utf8",
  });
  const { jobId, machineId, cookie, planId, floorCookie, listCookie } = JSON.parse(out.trim().split("\n").pop());
  // Issue 12: one run of the demo floor plan, sent again and again with the same device id: after the
  // first, every request is the retry path (read back and answered from the stored row).
  const run = { id: randomRunId(), planId, cylinder: 1, stagePosition: 0, block: "full", strokesDone: 5, readings: null, temperatures: null, notes: "bench (invented)", doneAt: new Date().toISOString() };
  const body = { mode: "job", jobId, machineId, clearance: { minUm: 60, maxUm: 90 }, boring: { enabled: true, marginUm: 10 } };
  const headers = { cookie, origin: base, "content-type": "application/json" };
  let n = 0;
  // A different body on every request (the target clearance moves in 0.1 µm steps), so the answer memo
  // never answers: what a machinist typing values costs the server.
  const varied = () => JSON.stringify({ ...body, clearance: { ...body.clearance, targetUm: 65 + ((n++ % 200) / 10) } });
  return [
    { name: "POST /api/plans/preview (8 cyl, same body)", path: "/api/plans/preview", method: "POST", headers, body: JSON.stringify(body) },
    { name: "POST /api/plans/preview (8 cyl, varied)", path: "/api/plans/preview", method: "POST", headers, setupRequest: (request) => ({ ...request, body: varied() }) },
    // The fixed cost of an authenticated POST (Next, the proxy, the session query, the body, the schema):
    // the same route with a body its schema refuses, answered 400 before anything is planned. Its
    // "errors" column counts those 400s.
    { name: "POST /api/plans/preview (refused body, 400)", path: "/api/plans/preview", method: "POST", headers, body: JSON.stringify({ mode: "job" }) },
    {
      name: "POST /api/floor/runs (a retried run)",
      path: "/api/floor/runs",
      method: "POST",
      headers: { cookie: floorCookie, origin: base, "content-type": "application/json" },
      body: JSON.stringify(run),
    },
    // Issue 18: a page beside the API routes, and the same page's server time for a shop with 1 000 jobs
    // (one connection, so the latency is the server's time for one request, not a queue).
    { name: "GET /jobs (8-cylinder bench shop)", path: "/jobs", headers: { cookie } },
    { name: "GET /jobs (1 000 jobs, 1 connection)", path: "/jobs", headers: { cookie: listCookie }, connections: 1 },
  ];
}
