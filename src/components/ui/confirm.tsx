"use client";
import { useEffect, useRef } from "react";
import { buttonClass } from "./button";

type Props = {
  question: string;
  /** What follows a yes, said plainly: who sees what, what cannot be undone. */
  consequence: string;
  yes: string;
  onYes: () => void;
  onNo: () => void;
  danger?: boolean;
  testId: string;
};

/**
 * The one confirmation: asks once more before an action that others feel (release, withdraw, remove a
 * member). Focus moves to its first button when it opens and back to what opened it when it closes;
 * Escape answers no.
 */
export function Confirm({ question, consequence, yes, onYes, onNo, danger = false, testId }: Props) {
  const first = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    first.current?.focus();
    return () => {
      if (opener?.isConnected && !opener.matches(":disabled")) opener.focus();
    };
  }, []);
  return (
    <div role="alertdialog" aria-modal="false" aria-labelledby={`${testId}-q`} aria-describedby={`${testId}-c`} data-testid={testId}
      onKeyDown={(e) => { if (e.key === "Escape") { e.stopPropagation(); onNo(); } }}
      className="flex flex-col gap-3 rounded-md border border-rule-strong bg-paper-raised p-4">
      <p id={`${testId}-q`} className="font-semibold">{question}</p>
      <p id={`${testId}-c`} className="text-ink-soft">{consequence}</p>
      <div className="flex flex-wrap gap-3">
        <button ref={first} type="button" className={buttonClass(danger ? "danger" : "primary")} onClick={onYes} data-testid={`${testId}-yes`}>{yes}</button>
        <button type="button" className={buttonClass("secondary")} onClick={onNo} data-testid={`${testId}-no`}>Cancel</button>
      </div>
    </div>
  );
}
