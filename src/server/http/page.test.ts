import { beforeEach, describe, expect, it, vi } from "vitest";
import type { Actor } from "@/shared/auth/policy";
import { AppError, notFound as notFoundError } from "@/server/errors";

const navigation = vi.hoisted(() => ({
  notFound: vi.fn(() => {
    throw new Error("NEXT_NOT_FOUND");
  }),
  redirect: vi.fn((to: string) => {
    throw new Error(`NEXT_REDIRECT ${to}`);
  }),
}));
const viewer = vi.hoisted(() => ({ current: null as { actor: Actor | null } | null }));
vi.mock("next/navigation", () => navigation);
vi.mock("@/server/auth/current", () => ({ getViewer: async () => viewer.current }));

const { orNotFound, pageActor } = await import("./page");

const apprentice: Actor = { userId: "u1", shopId: "s1", role: "apprentice" };

beforeEach(() => {
  vi.clearAllMocks();
  viewer.current = null;
});

describe("orNotFound", () => {
  it("passes a loaded value through", async () => {
    await expect(orNotFound(Promise.resolve(42))).resolves.toBe(42);
  });

  it("shows the 404 page for a row that is missing or of another shop", async () => {
    await expect(orNotFound(Promise.reject(notFoundError("Stone set")))).rejects.toThrow("NEXT_NOT_FOUND");
    expect(navigation.notFound).toHaveBeenCalledOnce();
  });

  it("lets every other error through unchanged", async () => {
    const forbidden = new AppError("forbidden", "Not for your role.");
    await expect(orNotFound(Promise.reject(forbidden))).rejects.toBe(forbidden);
    expect(navigation.notFound).not.toHaveBeenCalled();
  });
});

describe("pageActor", () => {
  it("sends a visitor without a shop session to sign-in", async () => {
    await expect(pageActor()).rejects.toThrow("NEXT_REDIRECT /sign-in");
    viewer.current = { actor: null };
    await expect(pageActor()).rejects.toThrow("NEXT_REDIRECT /sign-in");
  });

  it("sends an actor without the permission back to the fallback, and returns one who has it", async () => {
    viewer.current = { actor: apprentice };
    await expect(pageActor("stones.edit", "/stones")).rejects.toThrow("NEXT_REDIRECT /stones");
    await expect(pageActor("stones.view", "/stones")).resolves.toEqual(apprentice);
    await expect(pageActor()).resolves.toEqual(apprentice);
  });
});
