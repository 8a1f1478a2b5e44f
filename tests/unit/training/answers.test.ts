import { describe, expect, it } from "vitest";
import { KG_PER_LB, MM_PER_IN } from "@/lib/towing";
import { KG_PER_LB_EXACT, markAnswer, MM_PER_IN_EXACT, parseAnswer, toleranceFor } from "@/lib/training/answers";

describe("reading an answer", () => {
  it("uses the same exact factors as the core", () => {
    // Source: exact definition of the pound, 0.45359237 kg, and of the inch, 25.4 mm
    expect(KG_PER_LB_EXACT).toBeCloseTo(KG_PER_LB, 12);
    expect(MM_PER_IN_EXACT).toBeCloseTo(MM_PER_IN, 12);
  });

  it("reads thousands separators: commas, spaces, thin spaces and apostrophes", () => {
    expect(parseAnswer("1,075.86", "lb")).toEqual({ ok: true, value: 1075.86 });
    expect(parseAnswer("1 076", "lb")).toEqual({ ok: true, value: 1076 });
    expect(parseAnswer("1\u202f044", "mm")).toEqual({ ok: true, value: 1044 });
    expect(parseAnswer("13'560", "lb")).toEqual({ ok: true, value: 13560 });
    expect(parseAnswer("12,345,678", "lb")).toEqual({ ok: true, value: 12345678 });
  });

  it("reads a hyphen, a true minus sign and a dash as negative", () => {
    expect(parseAnswer("-275.86", "lb")).toEqual({ ok: true, value: -275.86 });
    expect(parseAnswer("\u2212275.86 lb", "lb")).toMatchObject({ ok: true, value: -275.86 });
    expect(parseAnswer("\u2013 90", "lb")).toEqual({ ok: true, value: -90 });
    expect(parseAnswer("+400", "lb")).toEqual({ ok: true, value: 400 });
  });

  it("refuses an empty answer, words and a decimal comma with a message that says what to fix", () => {
    expect(parseAnswer("", "lb")).toEqual({ ok: false, error: "Enter your answer as a number." });
    expect(parseAnswer("   ", "lb")).toMatchObject({ ok: false });
    expect(parseAnswer("about a ton", "lb")).toMatchObject({ ok: false, error: expect.stringContaining("Start the answer with a number") });
    expect(parseAnswer("1075,86", "lb")).toMatchObject({ ok: false, error: expect.stringContaining("point for decimals") });
    expect(parseAnswer("1,07,5", "lb")).toMatchObject({ ok: false });
    expect(parseAnswer("12 furlongs", "in")).toMatchObject({ ok: false, error: expect.stringContaining("not a unit") });
  });

  it("converts an answer in kg to a step in lb, and mm or cm to in", () => {
    // Physics: 1,075.86 lb × 0.45359237 = 488.0 kg
    const kg = parseAnswer("488 kg", "lb");
    expect(kg.ok && kg.value).toBeCloseTo(1075.84, 1);
    expect(kg.ok && kg.typedUnit).toBe("kg");
    // Physics: 152.4 mm ÷ 25.4 = 6 in
    const mm = parseAnswer("152.4 mm", "in");
    expect(mm.ok && mm.value).toBeCloseTo(6, 9);
    expect(parseAnswer("15.24cm", "in")).toMatchObject({ ok: true });
    // Physics: 6 in = 152.4 mm
    const inches = parseAnswer('6"', "mm");
    expect(inches.ok && inches.value).toBeCloseTo(152.4, 9);
  });

  it("refuses a unit of the wrong kind", () => {
    expect(parseAnswer("6 in", "lb")).toEqual({ ok: false, error: "This step asks for a weight (lb); in is a length." });
    expect(parseAnswer("9 kg", "%")).toMatchObject({ ok: false, error: expect.stringContaining("a share") });
  });
});

describe("marking within the tolerance", () => {
  // Physics: statics, TW × (WB + OH) ÷ WB = 800 × 195 ÷ 145 = 1,075.86 lb
  const rearGain = (800 * 195) / 145;

  it("accepts the shown rounding and the exact figure", () => {
    expect(markAnswer("1,076", rearGain, "lb").status).toBe("right");
    expect(markAnswer("1075.86", rearGain, "lb").status).toBe("right");
    expect(markAnswer("1075.9 lb", rearGain, "lb").status).toBe("right");
  });

  it("accepts the same figure given in kg", () => {
    expect(markAnswer("488 kg", rearGain, "lb").status).toBe("right");
    expect(markAnswer("800 kg", rearGain, "lb").status).toBe("wrong");
  });

  it("marks the tongue weight alone, the classic slip, as wrong", () => {
    expect(markAnswer("800", rearGain, "lb").status).toBe("wrong");
  });

  it("needs the sign of a negative result", () => {
    // Physics: statics, −TW × OH ÷ WB = −800 × 50 ÷ 145 = −275.86 lb
    const frontChange = -(800 * 50) / 145;
    expect(markAnswer("\u2212276", frontChange, "lb").status).toBe("right");
    expect(markAnswer("-275.86", frontChange, "lb").status).toBe("right");
    expect(markAnswer("276", frontChange, "lb").status).toBe("wrong");
  });

  it("uses the larger of the unit's allowance and 0.25 % of the value", () => {
    expect(toleranceFor(6, "in")).toBe(0.05);
    expect(toleranceFor(13560, "lb")).toBeCloseTo(33.9, 9);
    expect(markAnswer("6.05", 6, "in").status).toBe("right");
    expect(markAnswer("6.1", 6, "in").status).toBe("wrong");
    // Source: Ram owner's manuals (2015, 2018, 2023), citing SAE J2807: (1058 − 1046) ÷ 28 = 42.857 %
    expect(markAnswer("42.9 %", (12 / 28) * 100, "%").status).toBe("right");
    expect(markAnswer("43", (12 / 28) * 100, "%").status).toBe("right");
    expect(markAnswer("44", (12 / 28) * 100, "%").status).toBe("wrong");
    // Physics: geometry, atan(10 ÷ 30) = 18.43°
    expect(markAnswer("18.43°", (Math.atan(10 / 30) * 180) / Math.PI, "°").status).toBe("right");
    expect(markAnswer("18.5", (Math.atan(10 / 30) * 180) / Math.PI, "°").status).toBe("wrong");
  });

  it("reports an unreadable answer as invalid, not as wrong", () => {
    expect(markAnswer("", 100, "lb")).toEqual({ status: "invalid", error: "Enter your answer as a number." });
  });
});
