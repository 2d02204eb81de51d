import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { measuringOrder, nextCell } from "./next-cell";

describe("next cell on Enter", () => {
  it("follows the measuring order top A, top B, middle A, middle B, bottom A, bottom B, then leaves the grid", () => {
    const order = measuringOrder(["top", "middle", "bottom"]);
    expect(order).toEqual(["top.A", "top.B", "middle.A", "middle.B", "bottom.A", "bottom.B"]);
    const visited = ["top.A"];
    for (let at: string | null = nextCell(order, "top.A"); at; at = nextCell(order, at)) visited.push(at);
    expect(visited).toEqual(order);
    expect(nextCell(order, "bottom.B")).toBeNull();
    expect(nextCell(order, "nowhere")).toBeNull();
  });
  it("over any grid, Enter from the first cell visits every cell once, in order", () => {
    fc.assert(fc.property(fc.uniqueArray(fc.string({ minLength: 1, maxLength: 6 }), { minLength: 1, maxLength: 8 }), (levels) => {
      const order = measuringOrder(levels);
      const seen = [order[0]!];
      for (let at = nextCell(order, order[0]!); at !== null; at = nextCell(order, at)) seen.push(at);
      expect(seen).toEqual(order);
    }));
  });
});
