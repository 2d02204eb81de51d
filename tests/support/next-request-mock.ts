// What `next/headers` returns inside vitest: one cookie jar and one set of request headers per test
// worker, filled by tests/support/session.ts. Server code reads them exactly as it would in Next.js.
type CookieOptions = { expires?: Date; httpOnly?: boolean; sameSite?: string; secure?: boolean; path?: string; maxAge?: number };
export type StoredCookie = { name: string; value: string; options: CookieOptions };

export const cookieJar = new Map<string, StoredCookie>();
// Each test file starts from its own client address, so per-IP limits left by earlier runs in the same
// hour never carry over.
const hex = () => Math.floor(Math.random() * 0x10000).toString(16);
export const requestHeaders = new Headers({ "user-agent": "vitest", "x-borewise-client": `2001:db8:${hex()}::${hex()}` });

export const cookieStore = {
  get(name: string) {
    const c = cookieJar.get(name);
    return c ? { name: c.name, value: c.value } : undefined;
  },
  getAll() {
    return [...cookieJar.values()].map((c) => ({ name: c.name, value: c.value }));
  },
  has(name: string) {
    return cookieJar.has(name);
  },
  set(nameOrCookie: string | ({ name: string; value: string } & CookieOptions), value?: string, options: CookieOptions = {}) {
    if (typeof nameOrCookie === "string") cookieJar.set(nameOrCookie, { name: nameOrCookie, value: value ?? "", options });
    else {
      const { name, value: v, ...rest } = nameOrCookie;
      cookieJar.set(name, { name, value: v, options: rest });
    }
    return cookieStore;
  },
  delete(name: string | { name: string }) {
    cookieJar.delete(typeof name === "string" ? name : name.name);
    return cookieStore;
  },
  toString() {
    return [...cookieJar.values()].map((c) => `${c.name}=${c.value}`).join("; ");
  },
};

export const nextHeadersMock = {
  cookies: async () => cookieStore,
  headers: async () => requestHeaders,
  draftMode: async () => ({ isEnabled: false, enable() {}, disable() {} }),
};
