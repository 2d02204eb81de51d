import type { Metadata } from "next";
import { BackLink } from "@/components/ui/back-link";
import Link from "next/link";
import { can } from "@/shared/auth/policy";
import { getStoneDetail } from "@/server/stones/queries";
import { listStoneHistory } from "@/server/stones/history";
import { Card, PageTitle } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { buttonClass } from "@/components/ui/button";
import { WearBar } from "@/components/stones/wear-bar";
import { ABRASIVE_LABELS, STONE_ROLE_LABELS } from "@/shared/stones/constants";
import { length, micro } from "@/shared/units";
import { orNotFound, pageActor } from "@/server/http/page";
import { RateTable } from "../_components/rate-table";
import { HistoryList } from "../_components/history-list";
import { viewerUnits } from "@/server/units";
import { getStoneLearning } from "@/server/learning/queries";
import { LearningCard } from "../_components/learning-card";
import { adoptLearnedAction } from "../actions";
import { shopTimeZone } from "@/server/shop-settings/time-zone";

export const metadata: Metadata = { title: "Stone set" };

const SAVED: Record<string, string> = {
  created: "Stone set added. Add its rate rows next.",
  stone: "Saved as a new version.",
  rate: "Rate row saved as a new version.",
  restored: "Version restored as a new version.",
};

export default async function StonePage({ params, searchParams }: { params: Promise<{ stoneId: string }>; searchParams: Promise<{ saved?: string }> }) {
  const [{ stoneId }, { saved }] = await Promise.all([params, searchParams]);
  const actor = await pageActor();
  const zone = await shopTimeZone(actor);
  const { stone, rates } = await orNotFound(getStoneDetail({ actor, stoneId }));
  const [history, units, learning] = await Promise.all([listStoneHistory({ actor, stoneId }), viewerUnits(actor), getStoneLearning({ actor, stoneId })]);
  const canEdit = can(actor, "stones.edit");
  const facts: Array<[string, React.ReactNode]> = [
    ["Role", STONE_ROLE_LABELS[stone.role]],
    ["Abrasive", ABRASIVE_LABELS[stone.abrasive]],
    ["Grit", <span key="g" className="num">{stone.gritLabel} · mean grain {micro(stone.grainSizeUm, 1)}</span>],
    ["Bond", stone.bond],
    ["Stones", <span key="s" className="num">{stone.stonesPerHead} per head · {length(stone.stoneLengthUm, units, 0)} × {length(stone.stoneWidthUm, units)}</span>],
    ["Heights", <span key="h" className="num">start {length(stone.startHeightUm, units, 2)} · wear limit {length(stone.wearLimitHeightUm, units, 2)}</span>],
  ];
  return (
    <div className="flex flex-col gap-6">
      <BackLink href="/stones">Stone library</BackLink>
      <PageTitle actions={canEdit ? <Link href={`/stones/${stone.id}/edit`} className={buttonClass("secondary")} data-testid="edit-stone">Edit stone set</Link> : null}>
        <span data-testid="stone-code">{stone.code}</span> <span className="num text-ink-soft">{stone.gritLabel}</span>
        {stone.isDemo ? <span className="ml-3 rounded bg-steel-light px-2 align-middle text-caption text-steel-dark">Demo data</span> : null}
        {stone.active ? null : <span className="ml-3 rounded bg-paper-sunk px-2 align-middle text-caption">Retired</span>}
      </PageTitle>
      {saved && SAVED[saved] ? <Notice tone="pass">{SAVED[saved]}</Notice> : null}
      {canEdit ? null : <Notice title="Read only">The lead or the owner changes stone sets and rate rows; every change is kept below with who and why.</Notice>}
      <Card title="Stone set">
        <div className="grid gap-6 md:grid-cols-[2fr_1fr]">
          <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-2">
            {facts.map(([term, detail]) => (
              <div key={term} className="contents">
                <dt className="text-ink-soft">{term}</dt>
                <dd>{detail}</dd>
              </div>
            ))}
            {stone.notes ? (<><dt className="text-ink-soft">Notes</dt><dd>{stone.notes}</dd></>) : null}
          </dl>
          <div className="flex flex-col gap-2">
            <p className="font-semibold">Current height</p>
            <WearBar currentHeightUm={stone.currentHeightUm} wearLimitHeightUm={stone.wearLimitHeightUm} wear={stone.wear} units={units} />
            <p className="text-caption text-ink-faint num">Stone set version {stone.version}</p>
          </div>
        </div>
      </Card>
      <section id="rates">
        <Card title="Rate table" actions={canEdit ? <Link href={`/stones/${stone.id}/rates/new`} className={buttonClass("secondary")} data-testid="add-rate">Add rate row</Link> : null}>
          <p className="mb-3 text-caption text-ink-soft">
            Reference figures the plans use. Removal and clean-up are on the diameter. The learned rate appears beside each row once runs are logged.
          </p>
          {rates.length ? <RateTable stoneId={stone.id} rates={rates} canEdit={canEdit} units={units} /> : <p className="text-ink-soft">No rate rows yet: plans cannot use this stone set until it has one for the bore material.</p>}
        </Card>
      </section>
      <section id="learning">
        <Card title="Learned from runs">
          <p className="mb-3 text-caption text-ink-soft">
            What this shop&apos;s logged runs say about the rate, per bore material and machine (90 % interval). Plans already use the learned rate; Adopt writes it into the table.
          </p>
          <LearningCard entries={learning} adopt={can(actor, "rates.adopt") ? adoptLearnedAction : null} timeZone={zone} />
        </Card>
      </section>
      <section id="history">
        <Card title="History">
          <HistoryList stoneId={stone.id} entries={history} units={units} timeZone={zone} />
        </Card>
      </section>
    </div>
  );
}
