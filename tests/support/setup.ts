// Shared test set-up. Per-domain helpers live beside this file (tests/support/*).
import { vi } from "vitest";

// Server actions and route handlers read the session through next/headers; in vitest that module is
// the in-memory request of tests/support/next-request-mock.ts (filled by tests/support/session.ts).
vi.mock("next/headers", async () => (await import("./next-request-mock")).nextHeadersMock);

// Cache invalidation is a no-op outside a Next.js server.
vi.mock("next/cache", async (importOriginal) => ({
  ...(await importOriginal<Record<string, unknown>>()),
  revalidatePath: vi.fn(),
  revalidateTag: vi.fn(),
  updateTag: vi.fn(),
  refresh: vi.fn(),
}));
