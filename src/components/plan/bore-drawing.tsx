import type { Reversal } from "@/lib/honing";

type Props = {
  boreDiameterUm: number;
  boreLengthUm: number;
  stoneLengthUm: number;
  upperReversal: Reversal;
  lowerReversal: Reversal;
  includedAngleDeg: number;
  bottomClearanceUm?: number | null;
  label?: string;
};

const MM = (um: number) => um / 1000;

/**
 * The bore in section, to scale (1 unit = 1 mm): the deck, the wall, the stone at both reversal
 * points and the crosshatch the chosen speeds leave on the far wall. Drawing only: every length and
 * the angle come from the plan.
 */
export function BoreDrawing({ boreDiameterUm, boreLengthUm, stoneLengthUm, upperReversal, lowerReversal, includedAngleDeg, bottomClearanceUm, label }: Props) {
  const d = MM(boreDiameterUm);
  const len = MM(boreLengthUm);
  const wall = Math.max(8, d * 0.12);
  const stoneW = Math.max(3, d * 0.05);
  const top = Math.min(0, MM(upperReversal.stoneTopFromDeckUm)) - 6;
  const bottom = Math.max(len, MM(lowerReversal.stoneBottomFromDeckUm)) + 8;
  const font = Math.max(4, (len + 60) / 30);
  const left = -font * 3;
  const width = d + 2 * wall + font * 16 - left;
  const half = Math.tan(((includedAngleDeg / 2) * Math.PI) / 180);
  const spacing = Math.max(6, d / 10);
  const lines: Array<[number, number, number, number]> = [];
  for (let k = -Math.ceil((d * half) / spacing) - 2; k * spacing < len + 2 * spacing; k++) {
    const y0 = k * spacing;
    lines.push([wall, y0, wall + d, y0 + d * half], [wall, y0 + d * half, wall + d, y0]);
  }
  const stone = (r: Reversal, x: number, ghost: boolean) => (
    <rect x={x} y={MM(r.stoneTopFromDeckUm)} width={stoneW} height={MM(stoneLengthUm)} rx={1}
      className={ghost ? "fill-steel/30 stroke-steel" : "fill-steel stroke-steel-dark"} strokeWidth={0.6} strokeDasharray={ghost ? "2 1.5" : undefined} />
  );
  const dimX = wall * 2 + d + 6;
  return (
    <figure className="flex flex-col items-center">
      <svg viewBox={`${left} ${top} ${width} ${bottom - top}`} className="plan-drawing h-auto w-full max-w-[360px]" role="img" data-testid="bore-drawing"
        aria-label={`Bore ${d.toFixed(2)} mm by ${len.toFixed(1)} mm with the stone at both reversal points and a ${includedAngleDeg.toFixed(1)}° crosshatch, to scale`}>
        <defs>
          <clipPath id="bore-clip"><rect x={wall} y={0} width={d} height={len} /></clipPath>
        </defs>
        <rect x={0} y={0} width={wall} height={len} className="fill-rule" />
        <rect x={wall + d} y={0} width={wall} height={len} className="fill-rule" />
        <rect x={wall} y={0} width={d} height={len} className="fill-paper-raised" />
        <g clipPath="url(#bore-clip)" className="stroke-ink-faint" strokeWidth={0.35}>
          {lines.map(([x1, y1, x2, y2], i) => <line key={i} x1={x1} y1={y1} x2={x2} y2={y2} />)}
        </g>
        <line x1={-1} y1={0} x2={wall * 2 + d + 2} y2={0} className="stroke-ink" strokeWidth={0.8} />
        <text x={-1} y={font / 3} fontSize={font} textAnchor="end" className="fill-ink">deck</text>
        {bottomClearanceUm != null ? <line x1={wall} y1={len + MM(bottomClearanceUm)} x2={wall + d} y2={len + MM(bottomClearanceUm)} className="stroke-stop" strokeWidth={0.6} strokeDasharray="3 2" /> : null}
        {stone(upperReversal, wall, false)}
        {stone(upperReversal, wall + d - stoneW, false)}
        {stone(lowerReversal, wall, true)}
        {stone(lowerReversal, wall + d - stoneW, true)}
        <g className="fill-ink-soft" fontSize={font}>
          <line x1={dimX} y1={MM(upperReversal.stoneTopFromDeckUm)} x2={dimX} y2={MM(lowerReversal.stoneBottomFromDeckUm)} className="stroke-ink-soft" strokeWidth={0.4} />
          <text x={dimX + 2} y={MM(upperReversal.stoneTopFromDeckUm) + font}>upper reversal</text>
          <text x={dimX + 2} y={MM(lowerReversal.stoneBottomFromDeckUm) - 1}>lower reversal</text>
          <text x={dimX + 2} y={len / 2}>{includedAngleDeg.toFixed(1)}° crosshatch</text>
        </g>
      </svg>
      <figcaption className="text-caption text-ink-soft">{label ?? "To scale. Solid: stone at the upper reversal; dashed: at the lower reversal."}</figcaption>
    </figure>
  );
}
