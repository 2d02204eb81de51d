import { Notice } from "@/components/ui/notice";

// The usual cautions for honing work (DESIGN.md §8; trade-facts §10). Borewise plans the numbers; the
// machine maker's manual, local codes and licensed practice govern how the work is done safely.
export const CAUTIONS = [
  "Stop the spindle before gauging a bore, inserting or withdrawing the hone, or changing stones.",
  "Keep the guards and splash shields in place while the spindle turns.",
  "Neat honing oil and its mist can catch fire and harm lungs and skin: run the mist extraction, keep ignition sources away, and wipe up spills (slip hazard).",
  "Wear eye protection; honing oil and grit fly.",
  "No loose sleeves, gloves, jewellery or long hair near the turning spindle.",
] as const;

export function Cautions() {
  return (
    <Notice tone="caution" title="Safety at the machine">
      <ul className="ml-5 list-disc" data-testid="cautions">
        {CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
      <p className="mt-2 text-caption">
        These are reminders, not a procedure: follow the machine maker&apos;s manual, local codes and licensed practice.
      </p>
    </Notice>
  );
}
