import { describe, expect, it } from "vitest";
import { confirmSignupSchema, newPasswordField, organisationSettingsSchema, safeReturnPath, signInSchema, signUpSchema } from "@/lib/validation/auth";
import { fieldErrorsFrom } from "@/lib/validation/form-state";

describe("auth input", () => {
  it("normalises the e-mail address", () => {
    const parsed = signInSchema.parse({ email: "  Owner@Quillfield.Example.COM ", password: "x" });
    expect(parsed.email).toBe("owner@quillfield.example.com");
  });

  it("gives a message per field for a bad sign-up", () => {
    const result = signUpSchema.safeParse({ name: " ", email: "nope", organisationName: "", organisationKind: "castle" });
    expect(result.success).toBe(false);
    const errors = fieldErrorsFrom(result.error!.issues);
    expect(Object.keys(errors).sort()).toEqual(["email", "name", "organisationKind", "organisationName"]);
  });

  it("sign-up takes no password: it is chosen on the confirmation page, whose schema checks it", () => {
    expect(Object.keys(signUpSchema.shape)).not.toContain("password");
    const short = confirmSignupSchema.safeParse({ token: "a-token-of-enough-length", password: "short", confirmPassword: "short" });
    expect(fieldErrorsFrom(short.error!.issues).password).toEqual(["Use at least 10 characters."]);
  });

  it("caps the password length so hashing cannot be used to tie up the server", () => {
    expect(newPasswordField.safeParse("x".repeat(129)).success).toBe(false);
    expect(newPasswordField.safeParse("x".repeat(128)).success).toBe(true);
  });

  it("keeps the tight threshold between 1 % and 50 % and refuses what is not a number", () => {
    const base = { name: "Quillfield", units: "metric", frontAxleLossPercent: "10", linkLifetimeDays: "180" };
    expect(organisationSettingsSchema.safeParse({ ...base, tightMarginPercent: "10" }).success).toBe(true);
    for (const bad of ["0", "51", "abc", "1e309", "NaN"]) {
      expect(organisationSettingsSchema.safeParse({ ...base, tightMarginPercent: bad }).success, bad).toBe(false);
    }
  });

  it("keeps the front-axle loss limit between 1 % and 50 % and refuses what is not a number", () => {
    const base = { name: "Quillfield", units: "metric", tightMarginPercent: "10", linkLifetimeDays: "180" };
    expect(organisationSettingsSchema.safeParse({ ...base, frontAxleLossPercent: "10" }).success).toBe(true);
    expect(organisationSettingsSchema.safeParse({ ...base, frontAxleLossPercent: "50" }).success).toBe(true);
    for (const bad of [undefined, "0", "51", "abc", "1e309", "NaN"]) {
      expect(organisationSettingsSchema.safeParse({ ...base, frontAxleLossPercent: bad }).success, String(bad)).toBe(false);
    }
  });

  it("returns only to same-site paths after sign-in", () => {
    expect(safeReturnPath("/team")).toBe("/team");
    expect(safeReturnPath("https://elsewhere.example.com/")).toBe("/overview");
    expect(safeReturnPath("//elsewhere.example.com")).toBe("/overview");
    expect(safeReturnPath("/\\elsewhere.example.com")).toBe("/overview");
    expect(safeReturnPath(undefined)).toBe("/overview");
  });
});
