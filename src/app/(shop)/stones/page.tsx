import type { Metadata } from "next";
import Link from "next/link";
import { can } from "@/shared/auth/policy";
import { listStones } from "@/server/stones/queries";
import { PageTitle } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { WearBar } from "@/components/stones/wear-bar";
import { ABRASIVE_LABELS, STONE_ROLE_LABELS } from "@/shared/stones/constants";
import { length, micro } from "@/shared/units";
import { pageActor } from "@/server/http/page";
import { viewerUnits } from "@/server/units";

export const metadata: Metadata = { title: "Stone library" };

export default async function StonesPage() {
  const actor = await pageActor();
  const [stones, units] = await Promise.all([listStones({ actor }), viewerUnits(actor)]);
  const canEdit = can(actor, "stones.edit");
  return (
    <div className="flex flex-col gap-6">
      <PageTitle actions={canEdit ? <Link href="/stones/new" className={buttonClass("primary")} data-testid="add-stone">Add stone set</Link> : null}>
        Stone library
      </PageTitle>
      {canEdit ? null : (
        <Notice title="Read only">Your role can read the stone library. The lead or the owner changes it.</Notice>
      )}
      {stones.length === 0 ? (
        <p className="text-ink-soft">No stone sets yet.{canEdit ? " Add the sets your shop owns, then their rate rows per bore material." : ""}</p>
      ) : (
        <div className="relative overflow-x-auto rounded-lg border border-rule bg-paper-raised">
          <table className="w-full text-left" data-testid="stone-table">
            <thead className="border-b border-rule bg-paper-sunk text-caption uppercase tracking-wide text-ink-soft">
              <tr>
                <th scope="col" className="px-2 py-2">Code</th>
                <th scope="col" className="px-2 py-2">Role</th>
                <th scope="col" className="px-2 py-2">Abrasive · bond</th>
                <th scope="col" className="px-2 py-2">Grit</th>
                <th scope="col" className="px-2 py-2">Length × width</th>
                <th scope="col" className="px-2 py-2">Height vs wear limit</th>
                <th scope="col" className="px-2 py-2 text-right">Rate rows</th>
              </tr>
            </thead>
            <tbody>
              {stones.map((s) => (
                <tr key={s.id} className={`border-b border-rule last:border-0 ${s.active ? "" : "text-ink-faint"}`} data-testid="stone-row">
                  <td className="px-2 py-2">
                    <Link href={`/stones/${s.id}`} className="inline-flex min-h-touch items-center font-semibold text-steel underline-offset-2 hover:underline">
                      {s.code}
                    </Link>
                    {s.isDemo ? <span className="ml-2 rounded bg-steel-light px-1.5 text-caption text-steel-dark">Demo</span> : null}
                    {s.active ? null : <span className="ml-2 rounded bg-paper-sunk px-1.5 text-caption">Retired</span>}
                  </td>
                  <td className="px-2 py-2">{STONE_ROLE_LABELS[s.role]}</td>
                  <td className="px-2 py-2">{ABRASIVE_LABELS[s.abrasive]} · {s.bond}</td>
                  <td className="px-2 py-2 num whitespace-nowrap">{s.gritLabel}<br /><span className="text-caption text-ink-soft">mean grain {micro(s.grainSizeUm, 1)}</span></td>
                  <td className="px-2 py-2 num whitespace-nowrap">{length(s.stoneLengthUm, units, 0)} × {length(s.stoneWidthUm, units, 1)}<br /><span className="text-caption text-ink-soft">{s.stonesPerHead} per head</span></td>
                  <td className="px-2 py-2"><WearBar currentHeightUm={s.currentHeightUm} wearLimitHeightUm={s.wearLimitHeightUm} wear={s.wear} units={units} compact /></td>
                  <td className="px-2 py-2 text-right num">{s.rateCount}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
