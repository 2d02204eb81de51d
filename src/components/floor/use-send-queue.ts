"use client";
import { useCallback, useEffect } from "react";
import { readQueue, removeEntry, useOnline, useQueue } from "./device-store";
import { sendQueued } from "./send-queue";

const RETRY_MS = 5_000;

/** Sends the device's queue in order (sendQueued); waits for the network when it is gone. */
export function useSendQueue() {
  const queue = useQueue();
  const online = useOnline();
  const flush = useCallback(() => sendQueued(), []);

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
    const [head] = readQueue();
    if (head) removeEntry(head.id);
    void flush();
  }, [flush]);

  return { queue, online, flush, discardHead };
}
