import Link from "next/link";
import { boreMaterialLabel } from "@/lib/bore-materials";
import type { RateView } from "@/server/stones/queries";
import type { DisplayUnits } from "@/shared/units";
import { PRESSURE_UNIT_LABELS, RATE_SOURCE_LABELS } from "@/shared/stones/constants";
import { length, plain } from "@/shared/units";

const th = "px-3 py-2 font-semibold align-bottom";
// Below lg (a tablet) each row stacks into a card, every figure under its column's name (data-label).
const stacked = "max-lg:block max-lg:px-0 max-lg:py-1 max-lg:whitespace-normal max-lg:before:block max-lg:before:font-sans max-lg:before:text-caption max-lg:before:text-ink-soft max-lg:before:content-[attr(data-label)]";
const td = `px-3 py-2 num align-top whitespace-nowrap ${stacked}`;
const dash = <span className="text-ink-faint">—</span>;
const n = (v: number | null, d = 2) => (v == null ? dash : plain(v, d));

/** The rate table of one stone: one row per bore material, every column with its unit. */
export function RateTable({ stoneId, rates, canEdit, units }: { stoneId: string; rates: RateView[]; canEdit: boolean; units: DisplayUnits }) {
  return (
    // Eleven measured columns with the material pinned on a desktop; stacked per material on a tablet.
    <div className="relative overflow-x-auto" tabIndex={0} role="region" aria-label="Rate table">
      <table className="w-full text-left max-lg:block lg:min-w-[980px]" data-testid="rate-table">
        <caption className="sr-only">Rate table: removal, finish, clean-up and wear per bore material</caption>
        <thead className="border-b border-rule bg-paper-sunk text-caption text-ink-soft max-lg:sr-only">
          <tr>
            <th scope="col" className={`${th} bg-paper-sunk lg:sticky lg:left-0`}>Bore material</th>
            <th scope="col" className={th}>Removal per<br />double stroke<br />µm on Ø</th>
            <th scope="col" className={th}>Learned<br />µm on Ø</th>
            <th scope="col" className={th}>At pressure</th>
            <th scope="col" className={th}>Ref. bore length</th>
            <th scope="col" className={th}>Ra / Rz<br />µm</th>
            <th scope="col" className={th}>Rk / Rpk / Rvk<br />µm</th>
            <th scope="col" className={th}>Clean-up for<br />next stage<br />µm on Ø</th>
            <th scope="col" className={th}>Wear<br />µm per µm</th>
            <th scope="col" className={th}>±</th>
            <th scope="col" className={th}>Source</th>
            <th scope="col" className={th}>Version</th>
          </tr>
        </thead>
        <tbody className="max-lg:block">
          {rates.map((r) => (
            <tr key={r.id} className="border-b border-rule last:border-0 max-lg:grid max-lg:grid-cols-3 max-lg:gap-x-4 max-lg:py-2" data-testid="rate-row" data-material={r.boreMaterial}>
              <th scope="row" className="bg-paper-raised px-3 py-2 text-left align-top font-semibold max-lg:col-span-3 max-lg:flex max-lg:flex-wrap max-lg:items-center max-lg:gap-x-4 max-lg:px-0 lg:sticky lg:left-0 lg:max-w-48">
                {boreMaterialLabel(r.boreMaterial)}
                {canEdit ? (
                  <Link href={`/stones/${stoneId}/rates/${r.id}`} className="mt-1 flex min-h-touch items-center font-semibold text-steel underline-offset-2 hover:underline" data-testid="edit-rate">
                    Edit row<span className="sr-only"> {boreMaterialLabel(r.boreMaterial)}</span>
                  </Link>
                ) : null}
              </th>
              <td className={`${td} text-lead font-semibold`} data-label="Removal per double stroke, µm on Ø" data-testid="rate-removal">{plain(r.removalPerDoubleStrokeUm, 3)}</td>
              <td className={td} data-label="Learned, µm on Ø" title="Learned from logged runs: appears once runs are logged">{r.learned ? plain(r.learned.removalPerDoubleStrokeUm, 3) : dash}</td>
              <td className={td} data-label="At pressure">{plain(r.referencePressure, 2)} {PRESSURE_UNIT_LABELS[r.referencePressureUnit]}</td>
              <td className={td} data-label="Ref. bore length" data-testid="rate-bore-length">{length(r.referenceBoreLengthUm, units, 0)}</td>
              <td className={td} data-label="Ra / Rz, µm">{n(r.raUm)} / {n(r.rzUm, 1)}</td>
              <td className={td} data-label="Rk / Rpk / Rvk, µm">{r.rkUm == null && r.rpkUm == null && r.rvkUm == null ? dash : <>{n(r.rkUm)} / {n(r.rpkUm)} / {n(r.rvkUm)}</>}</td>
              <td className={td} data-label="Clean-up for next stage, µm on Ø">
                {r.cleanupMode === "explicit" ? plain(r.cleanupStockUm, 1) : <>2 × {plain(r.cleanupRzMultiple, 2)} × Rz = {plain(2 * (r.cleanupRzMultiple ?? 3) * r.rzUm, 1)}</>}
              </td>
              <td className={td} data-label="Wear, µm per µm">{plain(r.wearUmPerUmStock, 4)}</td>
              <td className={td} data-label="±">{plain(r.uncertaintyFraction * 100, 1)} %</td>
              <td className={`px-3 py-2 align-top whitespace-nowrap ${stacked}`} data-label="Source">{RATE_SOURCE_LABELS[r.source]}</td>
              <td className={td} data-label="Version">v{r.version}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
