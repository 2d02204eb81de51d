"use client";
import { Button } from "@/components/ui/button";
import { useSendQueue } from "./use-send-queue";

/** "Waiting to send: n", always visible on the floor, with the reason when the server refused an entry. */
export function SendStatus() {
  const { queue, online, flush, discardHead } = useSendQueue();
  const refused = queue[0]?.error;
  return (
    <div className="flex flex-wrap items-center gap-3 rounded-md border border-rule bg-paper-raised px-3 py-2" role="status" aria-live="polite">
      <span className={`font-semibold ${online ? "text-pass" : "text-caution"}`} data-testid="network-state">{online ? "Online" : "Offline"}</span>
      <span className="num text-lead" data-testid="waiting-count">Waiting to send: {queue.length}</span>
      {queue.length > 0 && online ? <Button variant="secondary" onClick={() => void flush()}>Send now</Button> : null}
      {refused ? (
        <span className="flex flex-wrap items-center gap-2 text-stop" role="alert">
          Not accepted: {refused}
          <Button variant="danger" onClick={discardHead}>Drop this entry</Button>
        </span>
      ) : null}
    </div>
  );
}
