import type { PreviewCylinder } from "@/server/plans/preview";
import { size, small, type DisplayUnits } from "@/shared/units";

/** Where a cylinder's piston came from, as the wizard says it. */
export const PISTON_SOURCE_TEXT: Record<string, string> = {
  typed: "size typed here", record: "chosen here", assigned: "recorded on this cylinder", paired: "proposed pairing", "label order": "by label (no pairing fits the band)",
};

/** The bore as measured: its largest reading, or the size it starts from (a typed bore or stock). */
const boreNow = (c: PreviewCylinder) => c.plan?.geometry?.maxUm ?? c.plan?.stock?.startDiameterUm ?? null;

/**
 * Each bore seen from the deck with the piston it is matched to inside it, framed when the wizard
 * proposed the match; under it the bore, the piston and the finished size with units. The gap between
 * them is drawn wide to be seen, not to scale: the figures say how big it is.
 */
export function PairingDrawing({ cylinders, units }: { cylinders: PreviewCylinder[]; units: DisplayUnits }) {
  if (cylinders.length === 0) return null;
  return (
    <figure className="flex flex-col gap-2" data-testid="pairing-drawing">
      <ul className="grid grid-cols-[repeat(auto-fill,minmax(10.5rem,1fr))] gap-3">
        {cylinders.map((c) => <Pair key={c.cylinder} cylinder={c} units={units} />)}
      </ul>
      <figcaption className="text-caption text-ink-soft">
        Each bore (outer ring) with its piston (inner disc), seen from the deck. Framed in blue: the proposed pairing, loose pistons matched so every
        bore cleans up with the most even stock. The gap is drawn wide, not to scale.
      </figcaption>
    </figure>
  );
}

function Pair({ cylinder: c, units }: { cylinder: PreviewCylinder; units: DisplayUnits }) {
  const paired = c.piston?.source === "paired";
  const bore = boreNow(c);
  const sizing = c.plan?.sizing;
  const words = `Cylinder ${c.cylinder}: bore ${size(bore, units)}, ${c.piston ? `piston ${c.piston.label} ${size(c.piston.diameterUm, units)}` : "no piston yet"}${sizing ? `, finished ${size(sizing.targetUm, units)}` : ""}`;
  return (
    <li className="flex min-w-0 flex-col items-center gap-1 rounded-md border border-rule bg-white p-2" data-testid={`pairing-${c.cylinder}`} data-paired={paired ? "true" : "false"}>
      <svg viewBox="0 0 100 100" className="h-24 w-24" role="img" aria-label={words}>
        <rect x={2} y={2} width={96} height={96} rx={8} fill="none" strokeWidth={paired ? 3 : 1.5}
          className={paired ? "stroke-steel" : "stroke-rule"} strokeDasharray={paired ? undefined : "4 3"} />
        <circle cx={50} cy={50} r={40} className="fill-rule" />
        <circle cx={50} cy={50} r={34} className="fill-paper-raised" />
        {c.piston ? (
          <>
            <circle cx={50} cy={50} r={27} className="fill-steel-light stroke-steel" strokeWidth={1.5} />
            {/* The pin axis: direction B of the readings. */}
            <line x1={26} y1={50} x2={74} y2={50} className="stroke-steel" strokeWidth={1} strokeDasharray="3 2" />
          </>
        ) : (
          <circle cx={50} cy={50} r={27} fill="none" className="stroke-stop" strokeWidth={1.5} strokeDasharray="4 3" />
        )}
        <text x={50} y={58} textAnchor="middle" fontSize={24} fontWeight={700} className="fill-ink">{c.cylinder}</text>
      </svg>
      <dl className="num grid w-full grid-cols-[auto_1fr] gap-x-2 text-caption">
        <dt className="text-ink-soft">Bore</dt><dd className="text-right">{size(bore, units)}</dd>
        <dt className="text-ink-soft">Piston</dt>
        <dd className={`text-right ${c.piston ? "" : "text-stop"}`}>{c.piston ? size(c.piston.diameterUm, units) : "none yet"}</dd>
        <dt className="text-ink-soft">Finished</dt><dd className="text-right font-semibold">{size(sizing?.targetUm, units)}</dd>
        <dt className="text-ink-soft">Clearance</dt><dd className="text-right">{small(sizing?.clearanceTargetUm, units)}</dd>
      </dl>
      {c.piston ? <p className="break-words text-center font-sans text-caption text-ink-soft">Piston <span className="font-semibold text-ink">{c.piston.label}</span>, {PISTON_SOURCE_TEXT[c.piston.source]}</p> : null}
    </li>
  );
}
