"use client";
import { useJobActions } from "./job-actions";
import { useState } from "react";
import { checkClearance, finishedBore, formatLength } from "@/lib/honing";
import { Card } from "@/components/ui/card";
import { FormMessage } from "@/components/ui/form-message";
import { PISTON_TYPE_LABELS } from "@/shared/jobs/constants";
import type { JobDetail } from "@/server/jobs/detail";

import { PistonForm } from "./piston-form";

function ClearanceMatrix({ detail }: { detail: JobDetail }) {
  const { pistons, units, summary } = detail;
  const bores = summary.cylinders.filter((c) => c.meanUm !== null);
  if (pistons.length === 0 || bores.length === 0) return null;
  // Clearance means something only in a bore that is at or near its finished size.
  if (!bores.some((b) => b.kind === "checkpoint" || b.kind === "final")) {
    return <p className="text-caption text-ink-soft" data-testid="clearance-matrix">Clearances per bore and the proposed pairing appear once bores have checkpoint or final readings; until then each piston shows the finished bore it asks for.</p>;
  }
  const pairs = summary.pairing?.result.ok ? summary.pairing.result.pairs : [];
  const proposed = (boreId: string, pistonId: string) => pairs.some((p) => p.boreId === boreId && p.pistonId === pistonId);
  return (
    <div className="overflow-x-auto" data-testid="clearance-matrix">
      <p className="mb-1 text-caption text-ink-soft">
        Clearance each piston would give in each bore (bore = mean of its latest reading set). Framed: the proposed pairing
        {summary.pairing?.result.ok ? <> (spread <span className="num">{formatLength(summary.pairing.result.spreadUm, units.small)}</span>)</> : null}.
      </p>
      <table className="text-body">
        <thead>
          <tr className="text-caption text-ink-soft">
            <th className="px-2 text-left">Piston</th>
            {bores.map((b) => <th key={b.cylinderId} className="px-2 text-right">Cyl. {b.number}</th>)}
          </tr>
        </thead>
        <tbody>
          {pistons.map((p) => (
            <tr key={p.id} className="border-t border-rule">
              <td className="px-2 py-1 font-semibold">{p.label}</td>
              {bores.map((b) => {
                const c = checkClearance({ boreDiameterUm: b.meanUm!, pistonDiameterUm: p.diameterUm, clearanceMinUm: p.clearanceMinUm, clearanceMaxUm: p.clearanceMaxUm });
                const tone = c.verdict === "in band" ? "text-pass" : "text-stop";
                return (
                  <td key={b.cylinderId} className={`num px-2 text-right ${tone} ${proposed(b.cylinderId, p.id) ? "rounded outline-2 outline-steel" : ""}`} title={c.verdict}>
                    {formatLength(c.clearanceUm, units.small)}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export function PistonsPanel({ detail, onChanged }: { detail: JobDetail; onChanged: () => void }) {
  const actions = useJobActions();
  const { units } = detail;
  const cylinderNumber = (id: string | null) => detail.cylinders.find((c) => c.id === id)?.number;
  const [editingId, setEditingId] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const editing = detail.pistons.find((p) => p.id === editingId);
  function edit(id: string) {
    setSaved(null);
    setEditingId(id);
  }
  function editSaved(label: string) {
    setEditingId(null);
    setSaved(`Piston ${label} saved.`);
    onChanged();
  }
  async function remove(id: string) {
    await actions.deletePiston(null, { jobId: detail.job.id, pistonId: id });
    onChanged();
  }
  return (
    <Card title="Pistons">
      <div className="flex flex-col gap-4" data-testid="pistons-panel">
        {detail.pistons.length === 0 ? <p className="text-ink-soft">No pistons measured yet.</p> : (
          <div className="overflow-x-auto">
            <table className="w-full min-w-[44rem] text-body">
              <thead>
                <tr className="text-left text-caption text-ink-soft">
                  <th className="py-1">Label</th><th>Cylinder</th><th>Type</th><th className="text-right">Diameter</th><th className="text-right">Sizing height</th><th className="text-right">Clearance band</th><th className="text-right">Finished bore (target)</th><th />
                </tr>
              </thead>
              <tbody>
                {detail.pistons.map((p) => (
                  <tr key={p.id} className={`border-t border-rule ${p.id === editingId ? "bg-steel-light" : ""}`} data-testid={`piston-row-${p.label}`}>
                    <td className="py-1 font-semibold">{p.label}</td>
                    <td>{cylinderNumber(p.cylinderId) ?? "not matched yet"}</td>
                    <td>{PISTON_TYPE_LABELS[p.type]}</td>
                    <td className="num text-right">{formatLength(p.diameterUm, units.size)}</td>
                    <td className="num text-right">{formatLength(p.sizingHeightUm, units.size, { decimals: 1 })}</td>
                    <td className="num text-right">{formatLength(p.clearanceMinUm, units.small)} – {formatLength(p.clearanceMaxUm, units.small)}</td>
                    <td className="num text-right" title="piston + middle of the maker's clearance band">{formatLength(finishedBore({ pistonDiameterUm: p.diameterUm, clearanceMinUm: p.clearanceMinUm, clearanceMaxUm: p.clearanceMaxUm }).targetUm, units.size)}</td>
                    <td className="whitespace-nowrap text-right">
                      {detail.permissions.editPistons ? (
                        <>
                          <button type="button" className="min-h-touch px-2 text-steel underline" onClick={() => edit(p.id)} data-testid="piston-edit" aria-label={`Edit piston ${p.label}`}>edit</button>
                          <button type="button" className="min-h-touch px-2 text-stop underline" onClick={() => void remove(p.id)} aria-label={`Remove piston ${p.label}`}>remove</button>
                        </>
                      ) : null}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
        <ClearanceMatrix detail={detail} />
        {saved ? <FormMessage state={{ ok: true, message: saved }} /> : null}
        {detail.permissions.editPistons ? (
          editing
            ? <PistonForm key={editing.id} detail={detail} editing={editing} onSaved={editSaved} onCancel={() => setEditingId(null)} />
            : <PistonForm key="add" detail={detail} onSaved={() => { setSaved(null); onChanged(); }} />
        ) : null}
      </div>
    </Card>
  );
}
