import { boreGeometry, formatLength, type LengthUnit } from "@/lib/honing";
import type { Tolerances } from "./geometry";

type Level = { name: string; aUm: number; bUm: number };

/** A recorded reading set as a compact table, with each out-of-tolerance figure marked. */
export function ReadingSetView({ levels, units, tolerances, testId }: { levels: Level[]; units: { size: LengthUnit; small: LengthUnit }; tolerances: Tolerances; testId?: string }) {
  if (levels.length === 0) return null;
  const g = boreGeometry({ levels });
  const bad = "font-semibold text-stop";
  return (
    <div data-testid={testId}>
      <table className="w-full text-body">
        <thead>
          <tr className="text-caption text-ink-soft">
            <th className="text-left font-semibold">Level</th>
            <th className="text-right font-semibold">A · thrust</th>
            <th className="text-right font-semibold">B · pin</th>
            <th className="text-right font-semibold">Out-of-round</th>
          </tr>
        </thead>
        <tbody>
          {levels.map((l) => {
            const oor = boreGeometry({ levels: [l] }).outOfRoundUm;
            return (
              <tr key={l.name} className="border-t border-rule">
                <td className="py-1 capitalize">{l.name}</td>
                <td className="num text-right">{formatLength(l.aUm, units.size)}</td>
                <td className="num text-right">{formatLength(l.bUm, units.size)}</td>
                <td className={`num text-right ${oor > tolerances.outOfRoundToleranceUm ? bad : ""}`}>{formatLength(oor, units.small)}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p className="mt-1 text-caption text-ink-soft">
        Taper <span className={`num ${g.taperUm > tolerances.taperToleranceUm ? bad : ""}`}>{formatLength(g.taperUm, units.small)}</span> ({g.taperDirection}
        {g.tightEnd ? `, tight at the ${g.tightEnd}` : ""}) · spread <span className="num">{formatLength(g.spreadUm, units.small)}</span>
      </p>
    </div>
  );
}
