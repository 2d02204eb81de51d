import Link from "next/link";
import { Card } from "@/components/ui/card";
import { WearBar } from "@/components/stones/wear-bar";
import type { Actor } from "@/shared/auth/policy";
import type { DisplayUnits } from "@/shared/units";
import { listStonesNearWearLimit } from "@/server/stones/queries";

/** Stone sets close to their wear limit, most worn first (DESIGN.md §4 dashboard). */
export async function StonesNearLimit({ actor, units }: { actor: Actor; units: DisplayUnits }) {
  const stones = await listStonesNearWearLimit({ actor });
  return (
    <Card title="Stones near their wear limit">
      {stones.length === 0 ? (
        <p className="text-ink-soft">Every active stone set has room to wear.</p>
      ) : (
        <ul className="flex flex-col divide-y divide-rule" data-testid="dashboard-stones-near-limit">
          {stones.map((s) => (
            <li key={s.id} className="grid items-center gap-2 py-2 sm:grid-cols-[12rem_1fr]">
              <Link href={`/stones/${s.id}`} className="min-h-touch content-center font-semibold text-steel underline">
                {s.code} <span className="num font-normal text-ink-soft">{s.gritLabel}</span>
              </Link>
              <WearBar currentHeightUm={s.currentHeightUm} wearLimitHeightUm={s.wearLimitHeightUm} wear={s.wear} units={units} compact />
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
