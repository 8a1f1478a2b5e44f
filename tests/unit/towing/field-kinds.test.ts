import { describe, expect, it } from "vitest";
import { FIELD_KINDS } from "@/lib/towing/field-kinds";
import { FIELD_RANGES } from "@/lib/towing/input";

describe("the field kinds a unit switch converts", () => {
  it("name every mass and length field of the schema, and nothing else", () => {
    const fromSchema = Object.fromEntries(
      Object.entries(FIELD_RANGES)
        .filter(([, range]) => range.kind === "mass" || range.kind === "length")
        .map(([path, range]) => [path, range.kind]),
    );
    // A field added to the schema is added to lib/towing/field-kinds.ts with the same kind.
    expect(FIELD_KINDS).toEqual(fromSchema);
  });
});
