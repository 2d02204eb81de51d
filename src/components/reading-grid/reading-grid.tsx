"use client";
import { useState, type KeyboardEvent } from "react";
import { formatLength, parseLength, type LengthUnit } from "@/lib/honing";
import { directionTaper, levelOutOfRound, liveGeometry, type GridLevel, type Tolerances } from "./geometry";

type Units = { size: LengthUnit; small: LengthUnit };
type Props = {
  levelNames: string[];
  units: Units;
  tolerances: Tolerances;
  errors?: Record<string, string[]>;
  onChange: (levels: GridLevel[]) => void;
  idPrefix: string;
};

const cell = "min-h-touch w-full rounded-md border bg-white px-2 text-right num text-lead";

function Computed({ label, um, limitUm, units, testId }: { label: string; um: number | null; limitUm: number; units: Units; testId: string }) {
  const over = um !== null && um > limitUm;
  return (
    <div className={`flex min-h-touch items-center gap-1 whitespace-nowrap rounded-md px-2 ${over ? "bg-stop-light text-stop" : "bg-paper-sunk"}`} data-testid={testId} data-over={over ? "true" : "false"}>
      {label ? <span className="text-caption text-ink-soft">{label}</span> : null}
      <span className="num font-semibold">{um === null ? "—" : formatLength(um, units.small)}</span>
      {over ? <span className="sr-only"> over the shop&apos;s {formatLength(limitUm, units.small)}</span> : null}
    </div>
  );
}

/**
 * The reading grid: levels down, directions A (thrust) and B (pin axis) across. The DOM runs down the
 * A column and then the B column, so Tab goes down the levels, then across (issue 5).
 */
export function ReadingGrid({ levelNames, units, tolerances, errors = {}, onChange, idPrefix }: Props) {
  const [texts, setTexts] = useState<Record<string, string>>({});
  const [problems, setProblems] = useState<Record<string, string>>({});
  const key = (i: number, d: "A" | "B") => `levels.${i}.${d === "A" ? "aUm" : "bUm"}`;
  const levels: GridLevel[] = levelNames.map((name, i) => ({ name, aUm: valueOf(texts[key(i, "A")]), bUm: valueOf(texts[key(i, "B")]) }));

  function valueOf(text: string | undefined): number | null {
    if (!text?.trim()) return null;
    const parsed = parseLength(text, units.size);
    return parsed.ok ? parsed.um : null;
  }

  const update = (k: string, text: string) => {
    const next = { ...texts, [k]: text };
    setTexts(next);
    const parsed = text.trim() ? parseLength(text, units.size) : null;
    setProblems((p) => ({ ...p, [k]: parsed && !parsed.ok ? parsed.error : "" }));
    onChange(levelNames.map((name, i) => ({ name, aUm: valueOfIn(next, key(i, "A")), bUm: valueOfIn(next, key(i, "B")) })));
  };
  const valueOfIn = (all: Record<string, string>, k: string) => valueOf(all[k]);
  // Enter moves on like Tab, so a gauge reading can be typed and confirmed without the mouse.
  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key !== "Enter") return;
    e.preventDefault();
    const inputs = Array.from(e.currentTarget.form?.querySelectorAll<HTMLInputElement>("input[data-grid-cell]") ?? []);
    inputs[inputs.indexOf(e.currentTarget) + 1]?.focus();
  };
  const geometry = liveGeometry(levels);
  const rows = levelNames.length + 1;

  const input = (i: number, d: "A" | "B") => {
    const k = key(i, d);
    const ofRound = levelOutOfRound(levels[i]!);
    const over = ofRound !== null && ofRound > tolerances.outOfRoundToleranceUm;
    const message = problems[k] || errors[k]?.join(" ");
    return (
      <div key={k} className="flex flex-col">
        <input
          id={`${idPrefix}-${k}`}
          data-grid-cell
          data-testid={`grid-${levelNames[i]}-${d}`}
          aria-label={`${levelNames[i]}, direction ${d} (${d === "A" ? "thrust" : "pin axis"}), ${units.size === "in" ? "inches" : "mm"}`}
          inputMode="decimal"
          autoComplete="off"
          value={texts[k] ?? ""}
          onChange={(e) => update(k, e.target.value)}
          onKeyDown={onKeyDown}
          aria-invalid={message || over ? true : undefined}
          className={`${cell} ${message ? "border-stop" : over ? "border-stop bg-stop-light" : "border-rule-strong"}`}
        />
        {message ? <span className="text-caption text-stop">{message}</span> : null}
      </div>
    );
  };

  return (
    <div className="flex flex-col gap-3">
      <div className="grid max-w-3xl grid-flow-col gap-x-3 gap-y-2" style={{ gridTemplateRows: `repeat(${rows}, auto)`, gridTemplateColumns: "minmax(5rem,auto) 1fr 1fr minmax(7rem,auto)" }}>
        <span className="text-caption font-semibold text-ink-soft">Level</span>
        {levelNames.map((n) => (
          <span key={n} className="flex min-h-touch items-center font-semibold capitalize">{n}</span>
        ))}
        <span className="text-caption font-semibold text-ink-soft">A · thrust ({units.size === "um" ? "µm" : units.size})</span>
        {levelNames.map((_, i) => input(i, "A"))}
        <span className="text-caption font-semibold text-ink-soft">B · pin axis ({units.size === "um" ? "µm" : units.size})</span>
        {levelNames.map((_, i) => input(i, "B"))}
        <span className="text-caption font-semibold text-ink-soft">Out-of-round</span>
        {levels.map((l, i) => (
          <Computed key={l.name} label="" um={levelOutOfRound(l)} limitUm={tolerances.outOfRoundToleranceUm} units={units} testId={`grid-oor-${i}`} />
        ))}
      </div>
      <div className="grid grid-cols-2 gap-2 sm:grid-cols-4" aria-live="polite">
        <Computed label="Taper A" um={directionTaper(levels, "A")} limitUm={tolerances.taperToleranceUm} units={units} testId="grid-taper-A" />
        <Computed label="Taper B" um={directionTaper(levels, "B")} limitUm={tolerances.taperToleranceUm} units={units} testId="grid-taper-B" />
        <Computed label="Out-of-round" um={geometry?.outOfRoundUm ?? null} limitUm={tolerances.outOfRoundToleranceUm} units={units} testId="grid-oor" />
        <Computed label="Spread" um={geometry?.spreadUm ?? null} limitUm={Number.POSITIVE_INFINITY} units={units} testId="grid-spread" />
      </div>
    </div>
  );
}
