import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { createShopWithMembers } from "../support/fixtures";
import { asUser } from "../support/session";
import { POST as importRoute } from "@/app/api/jobs/[jobId]/readings/import/route";
import { getJobDetail } from "@/server/jobs/detail";
import { formRequest, makeJob, routeContext } from "./jobs-support";
import { newClientId } from "@/shared/client-id";

const fixture = (name: string) => readFileSync(new URL(`../fixtures/uploads/${name}`, import.meta.url));
const csvFile = (name: string, body: string | Buffer, type = "text/csv") => new File([typeof body === "string" ? body : new Uint8Array(body)], name, { type });

async function setUp(label: string) {
  const shop = await createShopWithMembers(label);
  const { jobId } = await makeJob(shop.actors.machinist, { cylinderCount: 6 });
  const session = await asUser(shop.actors.machinist);
  const post = (fields: Record<string, string | File>, init = {}) =>
    importRoute(formRequest(`/api/jobs/${jobId}/readings/import`, session.cookieHeader, fields, init), routeContext({ jobId }));
  const setCount = async () => (await getJobDetail({ actor: shop.actors.machinist, jobId })).readingSets.length;
  return { shop, jobId, post, setCount };
}

describe("gauge CSV import through the route", () => {
  it("previews a good file without writing, then writes it in one go", async () => {
    const { post, setCount } = await setUp("csv-good");
    const preview = await post({ file: csvFile("gauge.csv", fixture("gauge-cylinder-2.csv")), kind: "as_received", mode: "preview" });
    expect(preview.status).toBe(200);
    const body = await preview.json();
    expect(body).toMatchObject({ ok: true, written: false });
    // Taper A 92.031 − 92.018 = 13 µm, B 92.034 − 92.020 = 14 µm → worst 14; out-of-round worst 3 µm at the top [D].
    expect(body.sets[0]).toMatchObject({ cylinder: 2, taperUm: 14, outOfRoundUm: 3 });
    expect(await setCount()).toBe(0);
    const commit = await post({ file: csvFile("gauge.csv", fixture("gauge-cylinder-2.csv")), kind: "as_received", mode: "commit" });
    expect(commit.status).toBe(201);
    expect(await setCount()).toBe(1);
  });

  it("a commit sent twice with one id (a retry) writes the sets once (issue 15)", async () => {
    const { post, setCount } = await setUp("csv-retry");
    const clientId = newClientId();
    const send = () => post({ file: csvFile("gauge.csv", fixture("gauge-cylinder-2.csv")), kind: "as_received", mode: "commit", clientId });
    const [a, b] = await Promise.all([send(), send()]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect((await send()).status).toBe(201);
    expect(await setCount()).toBe(1);
  });

  it("writes nothing for a file with bad rows and lists every one with its line", async () => {
    const { post, setCount } = await setUp("csv-bad");
    const res = await post({ file: csvFile("gauge.csv", fixture("gauge-bad-rows.csv")), mode: "commit" });
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.written).toBe(false);
    expect(body.problems.map((p: { line: number }) => p.line)).toEqual([2, 3, 4, 5, 6, 7]);
    expect(body.problems[0].reason).toMatch(/cylinder 1 top has direction A but not B/);
    expect(body.problems[1].reason).toMatch(/cylinder "9" is not 1–6/);
    expect(body.problems[2].reason).toMatch(/direction "C"/);
    expect(body.problems[3].reason).toMatch(/expected 5 fields/);
    expect(body.problems[4].reason).toMatch(/more than 3 mm/);
    expect(body.problems[5].reason).toMatch(/unit "furlong"/);
    expect(await setCount()).toBe(0);
  });

  it("refuses a huge file by size and a file that is not CSV", async () => {
    const { post, setCount } = await setUp("csv-refuse");
    const huge = "cylinder,level,direction,value,unit\n" + "1,top,A,92.031,mm\n".repeat(20_000);
    const big = await post({ file: csvFile("gauge.csv", huge), mode: "commit" });
    expect(big.status).toBe(413);
    expect((await big.json()).message).toMatch(/larger than the 256 KB limit/);
    const png = await post({ file: csvFile("gauge.csv", fixture("bore-photo.png")), mode: "commit" });
    expect(png.status).toBe(400);
    expect((await png.json()).message).toMatch(/not plain text/);
    const pdf = await post({ file: csvFile("report.pdf", fixture("surface-report.pdf"), "application/pdf"), mode: "commit" });
    expect((await pdf.json()).message).toMatch(/Only \.csv files/);
    expect(await setCount()).toBe(0);
  });

  it("refuses an apprentice (403), another shop (404) and a cross-site post (403)", async () => {
    const { shop, jobId, post } = await setUp("csv-perm");
    const other = await createShopWithMembers("csv-perm-o");
    const file = () => csvFile("gauge.csv", fixture("gauge-cylinder-2.csv"));
    expect((await post({ file: file() }, { origin: "https://evil.example" })).status).toBe(403);
    const apprentice = await asUser(shop.actors.apprentice);
    const asApprentice = await importRoute(formRequest(`/api/jobs/${jobId}/readings/import`, apprentice.cookieHeader, { file: file() }), routeContext({ jobId }));
    expect(asApprentice.status).toBe(403);
    const stranger = await asUser(other.actors.owner);
    const asStranger = await importRoute(formRequest(`/api/jobs/${jobId}/readings/import`, stranger.cookieHeader, { file: file() }), routeContext({ jobId }));
    expect(asStranger.status).toBe(404);
  });
});
