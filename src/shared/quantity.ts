/**
 * Numbers typed with their unit ("9 bar", "130 psi", "250 rpm", "45°"), read into the unit a field
 * stores, like parseLength does for lengths. Anything else is a clear error, never NaN.
 */
export type ParseQuantityResult = { ok: true; value: number } | { ok: false; error: string };

/** Factor to bar. 1 bar = 10⁵ Pa exactly (SI brochure, BIPM); 1 psi = 0.45359237 kg × 9.80665 m/s² / (0.0254 m)² = 6 894.757 293 168 Pa exactly (1959 yard and pound agreement [V S24], standard gravity). */
const TO_BAR: Record<string, number> = {
  bar: 1, kpa: 0.01, mpa: 10, psi: 0.06894757293168, "lb/in²": 0.06894757293168, "lbf/in²": 0.06894757293168,
};

const NUMBER_WITH_WORD = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+))\s*(.*)$/;

function split(text: string): { value: number; word: string } | null {
  const trimmed = String(text ?? "").trim();
  if (/^\d+,\d+/.test(trimmed)) return null;
  const match = NUMBER_WITH_WORD.exec(trimmed);
  if (!match) return null;
  const value = Number(match[1]);
  return Number.isFinite(value) ? { value, word: (match[2] ?? "").trim().toLowerCase() } : null;
}

const short = (text: string) => (text.length > 24 ? `${text.slice(0, 24)}…` : text);

/** A number with one of `words` (or bare), e.g. rpm or degrees. */
export function parseWithUnit(text: string, words: readonly string[], label: string): ParseQuantityResult {
  const parts = split(text);
  if (!parts) return { ok: false, error: String(text ?? "").includes(",") ? "Use a point for decimals." : `"${short(String(text ?? "").trim())}" is not a number.` };
  if (parts.word !== "" && !words.includes(parts.word)) return { ok: false, error: `Unknown unit "${short(parts.word)}": give the ${label} in ${words[0]}.` };
  return { ok: true, value: parts.value };
}

/** A feed pressure in the rate row's unit: bar converts from kPa, MPa and psi; a dial setting or a force in N only as typed. */
export function parsePressure(text: string, unit: "bar" | "dial" | "N"): ParseQuantityResult {
  const parts = split(text);
  if (!parts) return { ok: false, error: String(text ?? "").includes(",") ? "Use a point for decimals." : `"${short(String(text ?? "").trim())}" is not a pressure. Write e.g. 9 bar or 130 psi.` };
  const { value, word } = parts;
  if (value < 0) return { ok: false, error: "A pressure cannot be negative." };
  if (word === "") return { ok: true, value };
  if (unit === "bar") {
    const factor = TO_BAR[word];
    if (factor === undefined) return { ok: false, error: `Unknown unit "${short(word)}". Use bar, kPa, MPa or psi.` };
    return { ok: true, value: Number((value * factor).toPrecision(12)) };
  }
  if (unit === "dial") return word === "dial" ? { ok: true, value } : { ok: false, error: "This rate is a dial setting: type the dial number, not a pressure." };
  return word === "n" ? { ok: true, value } : { ok: false, error: "This rate is a feed force in N: type newtons; bar or psi need the stones' area to convert." };
}
