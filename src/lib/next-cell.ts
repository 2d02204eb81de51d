/**
 * Where Enter goes in an entry grid filled in a fixed order (a keyboard-wedge gauge types a value, then
 * Enter): the next cell, or null after the last, where the caller moves on to its own next control.
 */
export function nextCell<T>(order: readonly T[], current: T): T | null {
  const at = order.indexOf(current);
  if (at < 0 || at >= order.length - 1) return null;
  return order[at + 1]!;
}

/** The floor's measuring order: each level from the top down, direction A then B. */
export const measuringOrder = (levels: readonly string[], directions: readonly string[] = ["A", "B"]): string[] =>
  levels.flatMap((level) => directions.map((d) => `${level}.${d}`));
