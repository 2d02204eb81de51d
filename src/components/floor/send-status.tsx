"use client";
import { Button } from "@/components/ui/button";
import { useSendQueue } from "./use-send-queue";

const entries = (n: number) => `${n} ${n === 1 ? "entry" : "entries"}`;

/** "Waiting to send: n", always visible on the floor, with the reason when the server refused an entry. */
export function SendStatus() {
  const { queue, waitingForOthers, online, flush, discardHead } = useSendQueue();
  const refused = queue[0]?.error;
  return (
    <div className="flex flex-wrap items-center gap-3 rounded-md border border-rule bg-paper-raised px-3 py-2" role="status" aria-live="polite">
      <span className={`font-semibold ${online ? "text-pass" : "text-caution"}`} data-testid="network-state">{online ? "Online" : "Offline"}</span>
      <span className="num text-lead" data-testid="waiting-count">Waiting to send: {queue.length}</span>
      {queue.length > 0 && online ? <Button variant="secondary" onClick={() => void flush()}>Send now</Button> : null}
      {waitingForOthers.others > 0 ? (
        <span className="text-ink-soft" data-testid="waiting-others">{entries(waitingForOthers.others)} from another person {waitingForOthers.others === 1 ? "is" : "are"} waiting (sent when they sign in)</span>
      ) : null}
      {waitingForOthers.otherShop > 0 ? (
        <span className="text-ink-soft" data-testid="waiting-other-shop">{entries(waitingForOthers.otherShop)} of yours for another shop {waitingForOthers.otherShop === 1 ? "is" : "are"} waiting</span>
      ) : null}
      {refused ? (
        <span className="flex flex-wrap items-center gap-2 text-stop" role="alert">
          Not accepted: {refused}
          <Button variant="danger" onClick={discardHead}>Drop this entry</Button>
        </span>
      ) : null}
    </div>
  );
}
