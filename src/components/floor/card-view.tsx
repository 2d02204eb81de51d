import type { ReactNode } from "react";
import { CARD_CAUTIONS, CAUTION_DEFERRAL, type StepCard } from "@/shared/floor/cards";

/** One card: a title, its large figures (units always shown), its lines and cautions, then the card's controls. */
export function CardView({ card, step, of, children, print = false }: { card: StepCard; step: number; of: number; children?: ReactNode; print?: boolean }) {
  const id = `${print ? "print-" : ""}${card.key}`;
  return (
    <section className="step-card flex flex-col gap-4 rounded-lg border border-rule bg-paper-raised p-5" data-testid={`${print ? "print-" : ""}card-${card.key}`} aria-labelledby={`title-${id}`}>
      <p className="text-caption text-ink-soft">Card {step} of {of}</p>
      <h2 id={`title-${id}`} className="text-display">{card.title}</h2>
      {card.figures.length > 0 ? (
        <dl className="grid gap-3 sm:grid-cols-2">
          {card.figures.map((f) => (
            <div key={f.label} className="rounded-md bg-paper-sunk px-3 py-2">
              <dt className="text-caption text-ink-soft">{f.label}</dt>
              <dd className="num text-gauge" data-testid={print ? undefined : `figure-${f.label}`}>{f.value}</dd>
            </div>
          ))}
        </dl>
      ) : null}
      {card.lines.map((line) => <p key={line} className="text-lead">{line}</p>)}
      {card.cautions.length > 0 ? (
        <div className="rounded-md border border-caution bg-caution-light px-3 py-2 text-caution" role="note">
          <ul className="ml-5 list-disc">{card.cautions.map((c) => <li key={c}>{CARD_CAUTIONS[c]}</li>)}</ul>
          <p className="mt-1 text-caption">{CAUTION_DEFERRAL}</p>
        </div>
      ) : null}
      {children}
    </section>
  );
}
