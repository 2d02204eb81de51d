import "server-only";
import { parseLength, type LengthUnit } from "@/lib/honing";
import type { Direction } from "@/shared/jobs/constants";
import { readingOutOfRange } from "@/shared/readings/schema";
import { GAUGE_CSV_MAX_BYTES } from "@/shared/uploads/file-rules";

// The gauge CSV format is our own and documented in docs/gauge-csv.md.
export const CSV_HEADER = ["cylinder", "level", "direction", "value", "unit"] as const;
export const MAX_CSV_ROWS = 2_000;

export type CsvProblem = { line: number; reason: string };
export type CsvReading = { line: number; cylinder: number; level: string; levelIndex: number; direction: Direction; diameterUm: number };
export type CsvCylinderSet = { cylinder: number; levels: Array<{ name: string; aUm: number; bUm: number }> };
export type CsvResult = { ok: true; readings: CsvReading[]; sets: CsvCylinderSet[] } | { ok: false; problems: CsvProblem[] };

export type CsvContext = { cylinderCount: number; levels: readonly string[]; defaultUnit: LengthUnit; standardBoreUm: number };

const UNIT_WORDS = new Set(["mm", "in", "inch", "thou", "mil", "um", "µm", "μm"]);

function splitFields(line: string): string[] {
  return line.split(",").map((f) => f.trim().replace(/^"(.*)"$/, "$1").trim());
}

function parseRow(fields: string[], line: number, ctx: CsvContext): CsvReading | CsvProblem {
  if (fields.length !== CSV_HEADER.length) return { line, reason: `expected 5 fields (cylinder,level,direction,value,unit), found ${fields.length}` };
  const [cylinderText = "", levelText = "", directionText = "", valueText = "", unitText = ""] = fields;
  if (!/^\d{1,2}$/.test(cylinderText) || Number(cylinderText) < 1 || Number(cylinderText) > ctx.cylinderCount) {
    return { line, reason: `cylinder "${cylinderText.slice(0, 12)}" is not 1–${ctx.cylinderCount}` };
  }
  const levelIndex = ctx.levels.findIndex((l) => l.toLowerCase() === levelText.toLowerCase());
  if (levelIndex < 0) return { line, reason: `level "${levelText.slice(0, 20)}" is not one of ${ctx.levels.join(", ")}` };
  const direction = directionText.toUpperCase();
  if (direction !== "A" && direction !== "B") return { line, reason: `direction "${directionText.slice(0, 12)}" must be A (thrust) or B (pin axis)` };
  const unit = unitText.toLowerCase();
  if (unit !== "" && !UNIT_WORDS.has(unit)) return { line, reason: `unit "${unitText.slice(0, 12)}" must be mm, in, thou or µm` };
  const parsed = parseLength(unit === "" ? valueText : `${valueText} ${unit}`, ctx.defaultUnit);
  if (!parsed.ok) return { line, reason: parsed.error };
  const range = readingOutOfRange(parsed.um, ctx.standardBoreUm);
  if (range) return { line, reason: range };
  return { line, cylinder: Number(cylinderText), level: ctx.levels[levelIndex]!, levelIndex, direction, diameterUm: parsed.um };
}

/** Every reading of one cylinder must come as A and B at each level it names, once. */
function groupSets(readings: CsvReading[], problems: CsvProblem[]): CsvCylinderSet[] {
  const byCylinder = new Map<number, Map<number, Partial<Record<Direction, CsvReading>>>>();
  for (const r of readings) {
    const levels = byCylinder.get(r.cylinder) ?? new Map();
    byCylinder.set(r.cylinder, levels);
    const point = levels.get(r.levelIndex) ?? {};
    const earlier = point[r.direction];
    if (earlier) problems.push({ line: r.line, reason: `cylinder ${r.cylinder} ${r.level} ${r.direction} is already on line ${earlier.line}` });
    else point[r.direction] = r;
    levels.set(r.levelIndex, point);
  }
  const sets: CsvCylinderSet[] = [];
  for (const [cylinder, levels] of [...byCylinder].sort((a, b) => a[0] - b[0])) {
    const rows = [...levels].sort((a, b) => a[0] - b[0]);
    for (const [, point] of rows) {
      const only = point.A ?? point.B!;
      if (!point.A || !point.B) problems.push({ line: only.line, reason: `cylinder ${cylinder} ${only.level} has direction ${only.direction} but not ${only.direction === "A" ? "B" : "A"}` });
    }
    sets.push({ cylinder, levels: rows.map(([, p]) => ({ name: (p.A ?? p.B)!.level, aUm: p.A?.diameterUm ?? 0, bUm: p.B?.diameterUm ?? 0 })) });
  }
  return sets;
}

function headerProblem(first: string | undefined): CsvProblem | null {
  const fields = splitFields(first ?? "").map((f) => f.toLowerCase());
  if (fields.join(",") === CSV_HEADER.join(",")) return null;
  return { line: 1, reason: `the first line must be the header "${CSV_HEADER.join(",")}"` };
}

/** Parses a gauge CSV; any bad row makes the whole file fail, with every problem listed by line. Never throws. */
export function parseGaugeCsv(text: string, ctx: CsvContext): CsvResult {
  if (text.length > GAUGE_CSV_MAX_BYTES) return { ok: false, problems: [{ line: 0, reason: `the file is larger than ${GAUGE_CSV_MAX_BYTES / 1024} KB` }] };
  const lines = text.replace(/^\uFEFF/, "").split(/\r\n|\n|\r/);
  const header = headerProblem(lines[0]);
  if (header) return { ok: false, problems: [header] };
  const problems: CsvProblem[] = [];
  const readings: CsvReading[] = [];
  lines.slice(1).forEach((raw, i) => {
    const line = i + 2;
    if (raw.trim() === "" || raw.trim().startsWith("#")) return;
    if (readings.length + problems.length >= MAX_CSV_ROWS) {
      if (readings.length + problems.length === MAX_CSV_ROWS) problems.push({ line, reason: `more than ${MAX_CSV_ROWS} rows` });
      return;
    }
    const row = parseRow(splitFields(raw), line, ctx);
    if ("reason" in row) problems.push(row);
    else readings.push(row);
  });
  if (readings.length === 0 && problems.length === 0) return { ok: false, problems: [{ line: 0, reason: "the file has a header but no readings" }] };
  const sets = groupSets(readings, problems);
  if (problems.length > 0) return { ok: false, problems: problems.sort((a, b) => a.line - b.line) };
  return { ok: true, readings, sets };
}
