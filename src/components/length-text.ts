// Text of a length field, shared by the client input and server-rendered forms (no "use client").
import { fromUm, toUm, type LengthUnit } from "@/lib/honing";

export const UNIT_LABEL: Record<LengthUnit, string> = { mm: "mm", in: "in", thou: "thou", um: "µm" };
const UNIT_WORD: Record<LengthUnit, string> = { mm: "millimetres", in: "inches", thou: "thou", um: "µm" };

/** The note under an empty or plain length field. */
export const bareNumberHint = (unit: LengthUnit) => `A bare number is in ${UNIT_WORD[unit]}; or type the unit (mm, in, thou, µm).`;

/**
 * The shortest number in `unit` that reads back as the same length to 0.1 µm (the database's
 * resolution), so an untouched field saves exactly what was stored: 100 mm shows "100" in mm and
 * "3.937008" in inches rather than a rounded "3.9370" that would drift on every save.
 */
export function lengthText(um: number | null | undefined, unit: LengthUnit): string {
  if (um == null || !Number.isFinite(um)) return "";
  const value = fromUm(um, unit);
  for (let decimals = 0; decimals < 9; decimals += 1) {
    const text = String(Number(value.toFixed(decimals)));
    if (Math.abs(toUm(Number(text), unit) - um) < 0.05) return text;
  }
  return String(value);
}
