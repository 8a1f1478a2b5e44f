import { describe, expect, it } from "vitest";
import { convertTypedFigure } from "@/components/check/rig-form";

describe("a typed profile figure follows the unit switch", () => {
  it("converts weights and lengths, rounded as entered figures are", () => {
    // Source: NIST SP 811 / international yard and pound agreement: 1 lb = 0.45359237 kg exactly.
    // 3,500 lb × 0.45359237 = 1,587.57 kg → 1588 kg (whole kilograms).
    expect(convertTypedFigure("3500", "mass", "metric")).toBe("1588");
    // 1,588 kg ÷ 0.45359237 = 3,500.94 lb → 3501 lb (whole pounds).
    expect(convertTypedFigure("1588", "mass", "imperial")).toBe("3501");
    // Source: 1 in = 25.4 mm exactly (same agreement). 50 in → 1,270 mm; 1,016 mm → 40.0 in.
    expect(convertTypedFigure("50", "length", "metric")).toBe("1270");
    expect(convertTypedFigure("1016", "length", "imperial")).toBe("40");
  });

  it("leaves angles, shares and unreadable text as typed", () => {
    expect(convertTypedFigure("12", "angle", "metric")).toBe("12");
    expect(convertTypedFigure("15", "percent", "metric")).toBe("15");
    expect(convertTypedFigure("heavy", "mass", "metric")).toBe("heavy");
    expect(convertTypedFigure("  ", "mass", "metric")).toBe("  ");
  });
});
