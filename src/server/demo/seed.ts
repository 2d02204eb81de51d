import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { appMarkers } from "@/server/db/schema";
import { seedDemoAccounts } from "./accounts";
import { seedDemoJobs } from "./jobs";
import { seedDemoStones } from "./stones";
import { seedDemoFloor } from "./floor";
import { seedDemoRecordJob } from "./record";
import { seedDemoBilling } from "./billing";
import { seedDemoRunHistory } from "./runs";

const DEMO_MARKER = "demo-seed";

export type DemoSignIn = { role: string; email: string; password: string };

// Each domain adds its demo data in its own file; the steps run in this order, once per database.
type SeedStep = { name: string; run: (context: DemoContext) => Promise<void> };
export type DemoContext = { shopId: string | null; signIns: DemoSignIn[]; userIdsByRole: Record<string, string> };

const STEPS: SeedStep[] = [
  { name: "accounts", run: seedDemoAccounts },
  { name: "stones and machines", run: seedDemoStones },
  { name: "jobs", run: seedDemoJobs },
  { name: "floor", run: async (context) => void (await seedDemoFloor(context)) },
  { name: "record", run: async (context) => void (await seedDemoRecordJob(context)) },
  { name: "billing", run: seedDemoBilling },
  { name: "run history", run: seedDemoRunHistory },
];

/** Seeds the invented demo shop when the database has never been seeded. Returns the demo sign-ins. */
export async function seedDemoIfEmpty(): Promise<{ seeded: boolean; signIns: DemoSignIn[] }> {
  const marker = await db.select().from(appMarkers).where(eq(appMarkers.name, DEMO_MARKER)).limit(1);
  if (marker.length > 0) return { seeded: false, signIns: [] };
  const context: DemoContext = { shopId: null, signIns: [], userIdsByRole: {} };
  for (const step of STEPS) await step.run(context);
  await db.insert(appMarkers).values({ name: DEMO_MARKER });
  return { seeded: true, signIns: context.signIns };
}
