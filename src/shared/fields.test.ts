import { describe, expect, it } from "vitest";
import { integerIn, lengthUm, mmAndInchText, mmText, numberIn, numberWithin, optionalNumberIn } from "./fields";

const messages = (result: { error?: { issues: { message: string }[] } }) => result.error?.issues.map((i) => i.message);

describe("limit texts", () => {
  it("names a length limit in mm as written, and in inches for inch users (1 in = 25.4 mm [V S24])", () => {
    expect(mmText(20_000)).toBe("20 mm");
    expect(mmText(500)).toBe("0.5 mm");
    expect(mmText(1_250)).toBe("1.25 mm");
    expect(mmAndInchText(300_000)).toBe("300 mm (11.8 in)");
    expect(mmAndInchText(10_000)).toBe("10 mm (0.394 in)");
    expect(mmAndInchText(0)).toBe("0 mm");
  });
});

describe("numberWithin", () => {
  const field = numberWithin({ min: 1, max: 5 }, "Between 1 and 5.", "Enter it.");
  it("keeps the limits inclusive and answers each miss with its own message", () => {
    expect(field.parse(1)).toBe(1);
    expect(field.parse(5)).toBe(5);
    expect(messages(field.safeParse(0.99))).toEqual(["Between 1 and 5."]);
    expect(messages(field.safeParse(5.01))).toEqual(["Between 1 and 5."]);
    expect(messages(field.safeParse(Number.NaN))).toEqual(["Enter it."]);
    expect(messages(field.safeParse("3"))).toEqual(["Enter it."]);
  });
});

describe("form field builders", () => {
  it("lengthUm reads µm numbers and form text with a unit, a bare number in mm", () => {
    const field = lengthUm("Stone length", { min: 10_000, max: 300_000 });
    expect(field.parse(75_000)).toBe(75_000);
    expect(field.parse("75")).toBe(75_000);
    expect(field.parse("2.95 in")).toBe(74_930); // 1 in = 25.4 mm [V S24]
    expect(messages(field.safeParse(""))).toEqual(["Enter the stone length."]);
    expect(messages(field.safeParse("5"))).toEqual(["Stone length must be 10 mm (0.394 in) to 300 mm (11.8 in)."]);
  });

  it("numberIn, integerIn and optionalNumberIn name the field, its limits and its unit", () => {
    expect(numberIn("Ra", { min: 0.02, max: 12 }, "µm").parse("0.6")).toBe(0.6);
    expect(messages(numberIn("Ra", { min: 0.02, max: 12 }, "µm").safeParse("13"))).toEqual(["Ra must be 0.02 to 12 µm."]);
    expect(messages(numberIn("Ra", { min: 0.02, max: 12 }).safeParse("lots"))).toEqual(["Ra must be a number."]);
    expect(messages(integerIn("Stones per head", { min: 1, max: 16 }).safeParse("2.5"))).toEqual(["Stones per head must be a whole number."]);
    expect(optionalNumberIn("Rk", { min: 0.01, max: 20 }).parse("")).toBeUndefined();
  });
});
