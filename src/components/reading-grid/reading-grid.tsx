"use client";
import { useEffect, useRef, useState, type KeyboardEvent } from "react";
import { nextCell } from "@/lib/next-cell";
import { formatLength, type LengthUnit } from "@/lib/honing";
import { directionTaper, levelOutOfRound, liveGeometry, type GridLevel, type Tolerances } from "./geometry";
import { readCell } from "./cell";

type Units = { size: LengthUnit; small: LengthUnit };
type Props = {
  levelNames: string[];
  units: Units;
  tolerances: Tolerances;
  /** The server's refusals per field; each clears as soon as its cell changes. */
  errors?: Record<string, string[]>;
  /** After a save was tried: an empty cell says so too. */
  submitted?: boolean;
  /** The job's standard bore: a reading the server would refuse as too far from it is refused here. */
  standardBoreUm?: number;
  /** Focus the first cell when the grid opens. */
  autoFocus?: boolean;
  onChange: (levels: GridLevel[]) => void;
  idPrefix: string;
};

type Direction = "A" | "B";
const NO_ERRORS: Record<string, string[]> = {};
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
 * The reading grid: one row per level, directions A (thrust) and B (pin axis) across. The DOM follows
 * the measuring order (top A, top B, middle A, …) and Enter moves on like Tab, the last Enter to the
 * form's submit button, so a keyboard-wedge gauge (value, then Enter) fills a cylinder hands-free.
 */
export function ReadingGrid({ levelNames, units, tolerances, errors = NO_ERRORS, submitted = false, standardBoreUm, autoFocus = false, onChange, idPrefix }: Props) {
  const [texts, setTexts] = useState<Record<string, string>>({});
  const [touched, setTouched] = useState<Record<string, boolean>>({});
  // Server errors are shown until their cell is edited; a new answer brings its own.
  const [seen, setSeen] = useState({ errors, edited: {} as Record<string, boolean> });
  if (seen.errors !== errors) setSeen({ errors, edited: {} });
  const first = useRef<HTMLInputElement>(null);
  useEffect(() => {
    if (autoFocus) first.current?.focus();
  }, [autoFocus]);

  const key = (i: number, d: Direction) => `levels.${i}.${d === "A" ? "aUm" : "bUm"}`;
  const read = (all: Record<string, string>, i: number, d: Direction) => readCell(all[key(i, d)], d, units.size, standardBoreUm);
  const levelsOf = (all: Record<string, string>): GridLevel[] => levelNames.map((name, i) => ({ name, aUm: read(all, i, "A").um, bUm: read(all, i, "B").um }));
  const levels = levelsOf(texts);

  const update = (k: string, text: string) => {
    const next = { ...texts, [k]: text };
    setTexts(next);
    setSeen((s) => ({ ...s, edited: { ...s.edited, [k]: true } }));
    onChange(levelsOf(next));
  };
  const order = levelNames.flatMap((_, i) => [key(i, "A"), key(i, "B")]);
  const onKeyDown = (k: string) => (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key !== "Enter") return;
    e.preventDefault();
    const next = nextCell(order, k);
    (next ? document.getElementById(`${idPrefix}-${next}`) : e.currentTarget.form?.querySelector<HTMLElement>("[type=submit]"))?.focus();
  };
  const geometry = liveGeometry(levels);

  const input = (i: number, d: Direction) => {
    const k = key(i, d);
    const reading = read(texts, i, d);
    const ofRound = levelOutOfRound(levels[i]!);
    const over = ofRound !== null && ofRound > tolerances.outOfRoundToleranceUm;
    const shown = touched[k] || submitted;
    const own = reading.error ?? (submitted && reading.um === null ? `Enter the reading in direction ${d}.` : null);
    const message = (shown ? own : null) ?? (seen.edited[k] ? undefined : errors[k]?.join(" "));
    const messageId = `${idPrefix}-${k}-error`;
    return (
      <div key={k} className="flex flex-col">
        <input
          ref={i === 0 && d === "A" ? first : undefined}
          id={`${idPrefix}-${k}`}
          data-grid-cell
          data-testid={`grid-${levelNames[i]}-${d}`}
          aria-label={`${levelNames[i]}, direction ${d} (${d === "A" ? "thrust" : "pin axis"}), ${units.size === "in" ? "inches" : "mm"}`}
          inputMode="decimal"
          autoComplete="off"
          enterKeyHint="next"
          value={texts[k] ?? ""}
          onChange={(e) => update(k, e.target.value)}
          onBlur={() => setTouched((t) => (t[k] ? t : { ...t, [k]: true }))}
          onKeyDown={onKeyDown(k)}
          aria-invalid={message || over ? true : undefined}
          aria-describedby={message ? messageId : undefined}
          className={`${cell} ${message ? "border-stop" : over ? "border-stop bg-stop-light" : "border-rule-strong"}`}
        />
        {message ? <span id={messageId} className="text-caption text-stop">{message}</span> : null}
      </div>
    );
  };

  const head = "text-caption font-semibold text-ink-soft";
  const unit = units.size === "um" ? "µm" : units.size;
  return (
    <div className="flex flex-col gap-3" data-targets="large">
      <div className="grid max-w-3xl gap-x-3 gap-y-2" style={{ gridTemplateColumns: "minmax(5rem,auto) 1fr 1fr minmax(7rem,auto)" }}>
        <span className={head}>Level</span>
        <span className={head}>A · thrust ({unit})</span>
        <span className={head}>B · pin axis ({unit})</span>
        <span className={head}>Out-of-round</span>
        {levelNames.map((n, i) => (
          <div key={n} className="contents">
            <span className="flex min-h-touch items-center font-semibold capitalize">{n}</span>
            {input(i, "A")}
            {input(i, "B")}
            <Computed label="" um={levelOutOfRound(levels[i]!)} limitUm={tolerances.outOfRoundToleranceUm} units={units} testId={`grid-oor-${i}`} />
          </div>
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
