"use client";
import { createContext, useContext, useEffect, useMemo, type ReactNode } from "react";
import { adoptUnowned, openDeviceStore, type EntryOwner } from "./device-store";

const PersonContext = createContext<EntryOwner | null>(null);

/** The person signed in on this tablet (and their shop): whose entries and drafts the floor shows and sends. */
export function FloorPerson({ userId, shopId, children }: { userId: string; shopId: string; children: ReactNode }) {
  const owner = useMemo(() => ({ userId, shopId }), [userId, shopId]);
  useEffect(() => {
    void openDeviceStore().then(() => adoptUnowned(owner));
  }, [owner]);
  return <PersonContext.Provider value={owner}>{children}</PersonContext.Provider>;
}

export function useFloorPerson(): EntryOwner {
  const owner = useContext(PersonContext);
  if (!owner) throw new Error("useFloorPerson needs <FloorPerson> (the floor layout) around it");
  return owner;
}
