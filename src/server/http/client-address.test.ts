import { describe, expect, it } from "vitest";
import { clientAddressFrom } from "./client-address";

describe("clientAddressFrom", () => {
  it("ignores X-Forwarded-For with no trusted proxy (the default): a client cannot pick its own key", () => {
    expect(clientAddressFrom("203.0.113.9", "198.51.100.7", 0)).toBe("198.51.100.7");
    expect(clientAddressFrom("1.1.1.1, 2.2.2.2", "198.51.100.7", 0)).toBe("198.51.100.7");
    expect(clientAddressFrom(undefined, "198.51.100.7", 0)).toBe("198.51.100.7");
  });

  it("behind one proxy takes the entry that proxy appended, not what the client wrote to its left", () => {
    expect(clientAddressFrom("6.6.6.6, 203.0.113.9", "10.0.0.2", 1)).toBe("203.0.113.9");
    expect(clientAddressFrom("6.6.6.6, 203.0.113.9, 10.0.0.3", "10.0.0.2", 2)).toBe("203.0.113.9");
  });

  it("never reads further left than the chain goes", () => {
    expect(clientAddressFrom("", "10.0.0.2", 3)).toBe("10.0.0.2");
    expect(clientAddressFrom(null, null, 0)).toBe("unknown");
  });
});
