"use client";
import { useCallback, useEffect, useRef } from "react";
import { readQueue, saveAnswer, useOnline, useQueue, writeQueue } from "./device-store";

const RETRY_MS = 5_000;

/** Sends the device's queue in order, one entry at a time; waits for the network when it is gone. */
export function useSendQueue() {
  const queue = useQueue();
  const online = useOnline();
  const sending = useRef(false);

  const flush = useCallback(async () => {
    if (sending.current) return;
    sending.current = true;
    try {
      for (;;) {
        const [next] = readQueue();
        if (!next || next.error) break;
        let response: Response;
        try {
          response = await fetch(next.url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(next.body) });
        } catch {
          break; // offline: tried again on reconnect or at the next tick
        }
        if (response.status >= 500 || response.status === 429 || response.status === 408) break;
        const answer: unknown = await response.json().catch(() => ({}));
        const rest = readQueue().filter((e) => e.id !== next.id);
        if (response.ok) {
          saveAnswer(next.id, answer);
          writeQueue(rest);
        } else {
          // Refused for good (bad input, not allowed, conflict): kept at the head with the reason, so the order holds.
          const message = (answer as { message?: string }).message ?? `Refused (${response.status}).`;
          writeQueue([{ ...next, error: message }, ...rest]);
          break;
        }
      }
    } finally {
      sending.current = false;
    }
  }, []);

  useEffect(() => {
    const goOnline = () => void flush();
    window.addEventListener("online", goOnline);
    const timer = window.setInterval(() => void flush(), RETRY_MS);
    void flush();
    return () => {
      window.removeEventListener("online", goOnline);
      window.clearInterval(timer);
    };
  }, [flush]);

  // A new entry is sent at once when the network allows; the timer and the "online" event cover the rest.
  useEffect(() => {
    if (queue.length > 0 && online) void flush();
  }, [queue.length, online, flush]);

  const discardHead = useCallback(() => {
    writeQueue(readQueue().slice(1));
    void flush();
  }, [flush]);

  return { queue, online, flush, discardHead };
}
