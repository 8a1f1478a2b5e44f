import { describe, expect, it } from "vitest";
import { formulaParts, partsText, substitutedParts, symbolPart } from "@/lib/training/formula";

describe("readable formulas", () => {
  it("turns the core's symbols into subscripts, a change into Δ and Greek names into letters", () => {
    expect(symbolPart("W_curb")).toEqual({ kind: "symbol", base: "W", sub: "curb" });
    expect(symbolPart("dR")).toEqual({ kind: "symbol", base: "ΔR" });
    expect(symbolPart("alpha")).toEqual({ kind: "symbol", base: "α" });
    expect(symbolPart("GVWR")).toEqual({ kind: "symbol", base: "GVWR" });
  });

  it("writes operators as a trainer does, keeping the brackets", () => {
    expect(partsText(formulaParts("TW * (WB + OH) / WB"))).toBe("TW × (WB + OH) ÷ WB");
    expect(partsText(formulaParts("GVWR - W_curb"))).toBe("GVWR − W_curb");
    expect(partsText(formulaParts("abs(D_mount - D)"))).toBe("|D_mount − D|");
    expect(partsText(formulaParts("atan(h / x) * 180 / pi"))).toBe("arctan(h ÷ x) × 180 ÷ π");
  });

  it("puts the numbers in, with units and negatives in brackets", () => {
    const step = {
      formula: "F_0 + dF",
      inputs: [
        { symbol: "F_0", label: "Front axle unhitched", value: 3100, unit: "lb" as const },
        { symbol: "dF", label: "Change on the front", value: -275.862, unit: "lb" as const },
      ],
    };
    expect(partsText(substitutedParts(step))).toBe("3,100 lb + (−276 lb)");
  });

  it("shows a formula mathjs cannot parse as written", () => {
    expect(formulaParts("a +* b")).toEqual([{ kind: "punct", text: "a +* b" }]);
  });
});
