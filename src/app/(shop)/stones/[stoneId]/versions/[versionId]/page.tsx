import type { Metadata } from "next";
import { BackLink } from "@/components/ui/back-link";
import { can } from "@/shared/auth/policy";
import { getVersion } from "@/server/stones/history";
import { getStoneDetail } from "@/server/stones/queries";
import { Card, PageTitle } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { fieldLabel, showField } from "@/shared/stones/format";
import { orNotFound, pageActor } from "@/server/http/page";
import { subjectOf } from "../../../_components/history-list";
import { RestoreForm } from "../../../_components/restore-form";
import { viewerUnits } from "@/server/units";
import { shopTimeZone } from "@/server/shop-settings/time-zone";
import { dateTimeText } from "@/shared/time";

export const metadata: Metadata = { title: "Version" };

export default async function VersionPage({ params }: { params: Promise<{ stoneId: string; versionId: string }> }) {
  const { stoneId, versionId } = await params;
  const actor = await pageActor();
  const zone = await shopTimeZone(actor);
  const [{ stone, rates }, entry, units] = await Promise.all([orNotFound(getStoneDetail({ actor, stoneId })), orNotFound(getVersion({ actor, stoneId, versionId })), viewerUnits(actor)]);
  const fields = Object.keys(entry.newValues);
  const currentVersion = entry.subject === "stone" ? stone.version : rates.find((r) => r.id === entry.rateRowId)?.version;
  const isCurrent = currentVersion === entry.version;
  const restorable = entry.kind !== "retire" && entry.kind !== "reactivate" && !isCurrent;
  return (
    <div className="flex flex-col gap-6">
      <BackLink href={`/stones/${stone.id}#history`}>{stone.code} history</BackLink>
      <PageTitle>
        {subjectOf(entry)} · version <span className="num">{entry.version}</span>
      </PageTitle>
      {isCurrent ? <Notice tone="pass">This is the current version.</Notice> : <Notice>The current version is {currentVersion ?? "—"}.</Notice>}
      <p className="text-ink-soft">
        {dateTimeText(entry.changedAt, zone)} by {entry.changedByName ?? "a former member"}: “{entry.reason}”
      </p>
      <Card title="Values">
        <div className="relative overflow-x-auto">
          <table className="w-full min-w-[520px] text-left" data-testid="version-values">
            <thead className="border-b border-rule text-caption text-ink-soft">
              <tr>
                <th scope="col" className="px-3 py-2">Field</th>
                <th scope="col" className="px-3 py-2">Before this version</th>
                <th scope="col" className="px-3 py-2">In this version</th>
              </tr>
            </thead>
            <tbody>
              {fields.map((f) => {
                const changed = entry.changed.includes(f) && entry.oldValues !== null;
                return (
                  <tr key={f} className={`border-b border-rule last:border-0 ${changed ? "bg-caution-light" : ""}`}>
                    <th scope="row" className="px-3 py-2 text-left font-semibold">{fieldLabel(f)}</th>
                    <td className="px-3 py-2 num">{entry.oldValues ? showField(f, entry.oldValues[f], units) : "—"}</td>
                    <td className="px-3 py-2 num">{showField(f, entry.newValues[f], units)}{changed ? <span className="sr-only"> (changed)</span> : null}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      </Card>
      {can(actor, "stones.edit") && restorable ? (
        <Card title="Restore these values">
          <p className="mb-3 text-caption text-ink-soft">
            The values in this version become the current ones as a new version.{entry.subject === "stone" ? " The stone's current height and whether it is in use stay as they are now." : ""}
          </p>
          <RestoreForm stoneId={stone.id} versionId={entry.id} version={entry.version} />
        </Card>
      ) : null}
    </div>
  );
}
