"use client";
import { useCallback, useEffect } from "react";
import { readQueueOf, removeEntry, useOnline, useQueueOf, useWaitingForOthers } from "./device-store";
import { useFloorPerson } from "./floor-person";
import { sendQueued } from "./send-queue";

const RETRY_MS = 5_000;

/** Sends the signed-in person's entries in order (sendQueued); waits for the network when it is gone. */
export function useSendQueue() {
  const owner = useFloorPerson();
  const queue = useQueueOf(owner);
  const waitingForOthers = useWaitingForOthers(owner);
  const online = useOnline();
  const flush = useCallback(() => sendQueued(owner), [owner]);

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
    const [head] = readQueueOf(owner);
    if (head) removeEntry(head.id);
    void flush();
  }, [flush, owner]);

  return { queue, waitingForOthers, online, flush, discardHead };
}
