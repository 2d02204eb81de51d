// How many floor entries wait on this tablet for each person, mirrored into localStorage by the device
// store, so the header's sign-out can ask first without loading the store (and IndexedDB) on every page.
const KEY = "borewise.floor.waiting";

let last = "";
export function noteWaiting(counts: Record<string, number>): void {
  const text = JSON.stringify(counts);
  if (text === last) return;
  last = text;
  try {
    window.localStorage.setItem(KEY, text);
  } catch {
    // No storage (private mode): the sign-out simply does not ask.
  }
}

/** Entries of this person not sent yet (0 when nothing is known). */
export function waitingOnDevice(userId: string): number {
  try {
    const counts = JSON.parse(window.localStorage.getItem(KEY) ?? "{}") as Record<string, unknown>;
    const n = counts[userId];
    return typeof n === "number" && Number.isInteger(n) && n > 0 ? n : 0;
  } catch {
    return 0;
  }
}

export const signOutQuestion = (n: number) =>
  `${n} ${n === 1 ? "entry" : "entries"} not sent yet: sign out anyway? They stay on this tablet for you.`;
