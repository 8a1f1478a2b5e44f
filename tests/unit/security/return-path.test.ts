import { describe, expect, it } from "vitest";
import { safeReturnPath } from "@/lib/validation/auth";
import { BYPASS_FORMS } from "../../support/redirect-bypass";

const APP = "https://towmargin.example.com";

function landsOn(path: string): string {
  // Where a browser goes from a Location header with this value, on the app's own page.
  return new URL(path, `${APP}/sign-in`).origin;
}

describe("the way back after sign-in", () => {
  it.each(BYPASS_FORMS)("keeps %j on the app's own origin", (form) => {
    const path = safeReturnPath(form);
    expect(path.startsWith("/")).toBe(true);
    expect(landsOn(path)).toBe(APP);
    // Decoded once more (a proxy or a framework may decode it), it still stays here.
    expect(landsOn(decodeURIComponent(path))).toBe(APP);
    expect(path).not.toMatch(/[\u0000-\u001f\\]/);
  });

  it("keeps an ordinary path with its query and fragment", () => {
    expect(safeReturnPath("/checks?level=over&page=2#list")).toBe("/checks?level=over&page=2#list");
    expect(safeReturnPath("/fleet/vehicles/abc")).toBe("/fleet/vehicles/abc");
  });

  it("falls back to the overview for nothing or nonsense", () => {
    expect(safeReturnPath(undefined)).toBe("/overview");
    expect(safeReturnPath("")).toBe("/overview");
    expect(safeReturnPath("overview")).toBe("/overview");
  });
});
