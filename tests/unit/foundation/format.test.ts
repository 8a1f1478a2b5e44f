import { describe, expect, it } from "vitest";
import { formatMargin, formatNumber, formatQuantity, formatRatio, savedCheckTitle } from "@/lib/format";

describe("display rounding", () => {
  it("rounds weights to whole units with separators and lengths to tenths", () => {
    expect(formatQuantity({ value: 3499.6, unit: "lb" })).toBe("3,500 lb");
    expect(formatQuantity({ value: 1587.573, unit: "kg" })).toBe("1,588 kg");
    expect(formatQuantity({ value: 5.96, unit: "in" })).toBe("6.0 in");
    expect(formatQuantity({ value: 1143.2, unit: "mm" })).toBe("1,143 mm");
  });

  it("writes margins with sign and share, and a true minus when over", () => {
    expect(formatMargin({ value: 200, unit: "lb", ratio: 0.04 })).toBe("+200 lb (+4.0 %)");
    expect(formatMargin({ value: -300, unit: "lb", ratio: -0.0857 })).toBe("\u2212300 lb (\u22128.6 %)");
    expect(formatRatio(0.125)).toBe("12.5 %");
  });

  it("never prints NaN or a negative zero", () => {
    expect(formatNumber(Number.NaN, "lb")).toBe("—");
    expect(formatNumber(-0.2, "lb")).toBe("0");
  });
});

describe("a saved check's title", () => {
  it("names the customer first, then the rig", () => {
    expect(savedCheckTitle({ customerName: "Dana Whitlock", vehicleLabel: "Harrow Rookfield 2500 pickup", hitchedLabel: "Travel trailer" })).toBe(
      "Dana Whitlock: travel trailer on Harrow Rookfield 2500 pickup",
    );
  });
  it("speaks of the customer's own vehicle when it was typed in without a name", () => {
    expect(savedCheckTitle({ customerName: "Dana Whitlock", vehicleLabel: "Typed vehicle", hitchedLabel: "Platform rack" })).toBe("Dana Whitlock: platform rack on their vehicle");
  });
  it("reads as the rig alone without a customer, and never shows the stored fallback label", () => {
    const title = savedCheckTitle({ customerName: null, vehicleLabel: "Typed vehicle", hitchedLabel: "Platform rack" });
    expect(title).toBe("Platform rack on a vehicle typed in");
    expect(title).not.toContain("Typed vehicle");
  });
});
