import { describe, expect, it } from "vitest";
import { checkCsvBytes, CSV_MAX_BYTES, csvColumns, exportFleetCsv, parseFleetCsv, templateCsv } from "@/lib/fleet/csv";
import { PROFILE_KINDS } from "@/lib/fleet/fields";
import { profileFormSchema } from "@/lib/validation/fleet";

const bytes = (text: string) => new TextEncoder().encode(text);

// Figures below are invented test inputs; where a range is checked its bound is the core's own FIELD_RANGES
// (docs/evaluate.md, "Valid ranges"), not a towing reference.

describe("the template", () => {
  it.each(PROFILE_KINDS)("%s: the template reads back as one valid row", (kind) => {
    const parsed = parseFleetCsv(templateCsv(kind), kind, "column");
    expect(parsed.fileErrors).toEqual([]);
    expect(parsed.rows).toHaveLength(1);
    expect(parsed.rows[0]!.errors).toEqual([]);
    expect(parsed.validCount).toBe(1);
  });

  it("names its own columns: name, units, then the fields", () => {
    expect(csvColumns("vehicles").slice(0, 3)).toEqual(["name", "units", "gvwr"]);
    expect(csvColumns("vehicles")).toContain("receiver_height");
    expect(csvColumns("vehicles")).toContain("pin_to_fascia");
  });
});

describe("mapping a row to a profile", () => {
  it("maps columns to the rig's parts, in the row's units", () => {
    const csv = "name,units,gvwr,curb_weight,weighed_front,weighed_rear,hitch_class,receiver_opening,receiver_height\nTruck 1,metric,3500,2300,1300,1200,3,2,520\n";
    const parsed = parseFleetCsv(csv, "vehicles", "column");
    expect(parsed.rows[0]!.errors).toEqual([]);
    expect(parsed.rows[0]!.profile).toEqual({
      name: "Truck 1",
      units: "metric",
      vehicle: { gvwr: 3500, curbWeight: 2300, axleWeights: { front: 1300, rear: 1200 } },
      hitch: { class: 3, receiverSize: "2", receiverHeight: 520 },
    });
  });

  it("accepts thousands separators and a unit that matches the row", () => {
    const csv = 'name,units,gvwr,curb_weight\nTruck 2,imperial,"7,000",5100 lb\n';
    const row = parseFleetCsv(csv, "vehicles", "column").rows[0]!;
    expect(row.errors).toEqual([]);
    expect(row.profile).toMatchObject({ vehicle: { gvwr: 7000, curbWeight: 5100 } });
  });

  it("reads yes/no and fills in a weight-distribution section", () => {
    const csv = "name,units,trailer_kind,gross_weight,wd_fitted,wd_tongue_rating\nCamper,imperial,travel,6000,yes,1000\n";
    const row = parseFleetCsv(csv, "trailers", "column").rows[0]!;
    expect(row.errors).toEqual([]);
    expect(row.profile).toMatchObject({ trailer: { type: "travel", grossTrailerWeight: 6000 }, weightDistribution: { used: true, tongueRating: 1000 } });
  });
});

describe("bad rows", () => {
  it("names the column of each problem and keeps the good rows", () => {
    const csv = [
      "name,units,gvwr,curb_weight,hitch_class,receiver_opening",
      "Good truck,imperial,7000,5000,3,2",
      ",imperial,7000,5000,3,2",
      "Bad numbers,imperial,lots,5000,7,5",
    ].join("\n");
    const parsed = parseFleetCsv(csv, "vehicles", "column");
    expect(parsed.validCount).toBe(1);
    expect(parsed.errorCount).toBe(2);
    expect(parsed.rows[1]!.errors.map((e) => e.column)).toEqual(["name"]);
    expect(parsed.rows[2]!.errors.map((e) => e.column).sort()).toEqual(["gvwr", "hitch_class", "receiver_opening"]);
    expect(parsed.rows[2]!.line).toBe(4);
  });

  it("refuses a value beyond the field's range, with the range in the row's units", () => {
    const csv = "name,units,hitch_tw\nTruck,imperial,7000\n";
    const row = parseFleetCsv(csv, "vehicles", "column").rows[0]!;
    expect(row.errors).toEqual([{ column: "hitch_tw", message: "Hitch tongue weight rating must be at most 6000 lb." }]);
  });

  it("refuses a trailer row without its type", () => {
    const row = parseFleetCsv("name,units,gross_weight\nTrailer,imperial,3000\n", "trailers", "column").rows[0]!;
    expect(row.errors.map((e) => e.column)).toEqual(["trailer_kind"]);
  });

  it("refuses a row with more values than columns", () => {
    const row = parseFleetCsv("name,units,gvwr\nTruck,imperial,7000,9,9\n", "vehicles", "column").rows[0]!;
    expect(row.errors.map((e) => e.column)).toEqual(["row"]);
  });
});

describe("wrong units", () => {
  it("catches a kg figure in an imperial file when it is beyond the range in lb", () => {
    // A receiver height of 530 mm typed into an imperial file reads as 530 in: beyond the 40 in maximum.
    const row = parseFleetCsv("name,units,receiver_height\nTruck,imperial,530\n", "vehicles", "column").rows[0]!;
    expect(row.errors).toEqual([{ column: "receiver_height", message: "Receiver height must be at most 40 in." }]);
  });

  it("catches a value that carries the other system's unit", () => {
    const row = parseFleetCsv("name,units,gvwr\nTruck,imperial,3200 kg\n", "vehicles", "column").rows[0]!;
    expect(row.errors[0]!.column).toBe("gvwr");
    expect(row.errors[0]!.message).toMatch(/in kg but this row is imperial/);
  });

  it("catches metric weights that pass the lb range but cannot be (curb weight at or above GVWR)", () => {
    // 3,200 kg GVWR and 3,900 lb curb: each inside its range, together impossible.
    const row = parseFleetCsv("name,units,gvwr,curb_weight\nTruck,imperial,3200,3900\n", "vehicles", "imperial").rows[0]!;
    expect(row.errors.map((e) => e.column)).toEqual(["curb_weight"]);
  });

  it("refuses a unit system it does not know, and a row that disagrees with the file's choice", () => {
    const parsed = parseFleetCsv("name,units,gvwr\nA,stone,7000\nB,metric,3000\n", "vehicles", "imperial");
    expect(parsed.rows[0]!.errors[0]).toMatchObject({ column: "units" });
    expect(parsed.rows[1]!.errors[0]!.message).toMatch(/row says metric, but the file was imported as imperial/);
  });

  it("refuses a column named with a unit, as a file error", () => {
    const parsed = parseFleetCsv("name,units,gvwr_kg\nA,metric,3000\n", "vehicles", "column");
    expect(parsed.rows).toEqual([]);
    expect(parsed.fileErrors[0]).toMatch(/"gvwr_kg" names a unit/);
  });

  it("needs a units column when the units are to come from the file", () => {
    const parsed = parseFleetCsv("name,gvwr\nA,7000\n", "vehicles", "column");
    expect(parsed.fileErrors[0]).toMatch(/no "units" column/);
    expect(parseFleetCsv("name,gvwr\nA,7000\n", "vehicles", "imperial").validCount).toBe(1);
  });
});

describe("duplicates", () => {
  it("refuses a second row with the same name, in any case", () => {
    const parsed = parseFleetCsv("name,units\nTruck 1,imperial\ntruck 1 ,imperial\n", "vehicles", "column");
    expect(parsed.rows[0]!.errors).toEqual([]);
    expect(parsed.rows[1]!.errors[0]!.message).toMatch(/same name as line 2/);
  });

  it("refuses a name already in the fleet", () => {
    const parsed = parseFleetCsv("name,units\nTruck 1,imperial\n", "vehicles", "column", { existingNames: ["TRUCK 1"] });
    expect(parsed.rows[0]!.errors[0]!.message).toMatch(/already in the fleet/);
  });

  it("refuses a column given twice", () => {
    expect(parseFleetCsv("name,gvwr,gvwr\nA,1,2\n", "vehicles", "imperial").fileErrors[0]).toMatch(/appears twice/);
  });
});

describe("files that are not fleet CSV", () => {
  it("refuses a 10 MB file before reading it", () => {
    const big = new Uint8Array(10 * 1024 * 1024);
    expect(CSV_MAX_BYTES).toBeLessThan(big.byteLength);
    expect(checkCsvBytes(big)).toMatch(/10\.0 MB; a fleet file may be at most 2 MB/);
  });

  it("refuses a PDF, a picture, a workbook and binary data", () => {
    expect(checkCsvBytes(bytes("%PDF-1.7\n..."))).toMatch(/PDF or a picture/);
    expect(checkCsvBytes(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))).toMatch(/PDF or a picture/);
    expect(checkCsvBytes(new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0, 0]))).toMatch(/workbook/);
    expect(checkCsvBytes(new Uint8Array([0x41, 0x00, 0x42]))).toMatch(/not text/);
    expect(checkCsvBytes(new Uint8Array([0x41, 0xc3, 0x28]))).toMatch(/UTF-8/);
    expect(checkCsvBytes(new Uint8Array())).toMatch(/empty/);
    expect(checkCsvBytes(bytes("name,units\nA,imperial\n"))).toBeNull();
  });

  it("refuses text that is not a fleet sheet: unknown columns, no name column, no rows", () => {
    const parsed = parseFleetCsv("Dear fleet manager,\nplease find attached\n", "vehicles", "imperial");
    expect(parsed.rows).toEqual([]);
    expect(parsed.fileErrors.join(" ")).toMatch(/is not a vehicle column/);
    expect(parsed.fileErrors.join(" ")).toMatch(/needs a "name" column/);
    expect(parseFleetCsv("name,units\n", "vehicles", "column").fileErrors).toEqual(["The file has a header but no rows."]);
  });

  it("refuses more than 5,000 rows", () => {
    const csv = `name,units\n${Array.from({ length: 5001 }, (_, i) => `T${i},imperial`).join("\n")}`;
    expect(parseFleetCsv(csv, "vehicles", "column").fileErrors[0]).toMatch(/5001 rows; import at most 5000/);
  });
});

describe("export", () => {
  it("writes the import's columns, so an export imports again unchanged", () => {
    const row = parseFleetCsv(templateCsv("vehicles"), "vehicles", "column").rows[0]!;
    const { name, units, ...data } = row.profile!;
    const csv = exportFleetCsv("vehicles", [{ name, units, data }]);
    const again = parseFleetCsv(csv, "vehicles", "column").rows[0]!;
    expect(again.profile).toEqual(row.profile);
  });

  it("keeps a name that a spreadsheet would run as a formula as text", () => {
    const csv = exportFleetCsv("accessories", [{ name: "=HYPERLINK(1)", units: "imperial", data: { accessory: { type: "other" } } }]);
    expect(csv.split("\r\n")[1]).toMatch(/^'=HYPERLINK/);
  });

  it("a name protected on export reads back without its apostrophe; an ordinary apostrophe stays", () => {
    const names = ["=HYPERLINK(1)", "+1 trailer", "-cold spare", "@home van", "'Tis the shop van"];
    const csv = exportFleetCsv("accessories", names.map((name) => ({ name, units: "imperial", data: { accessory: { type: "other" } } })));
    const again = parseFleetCsv(csv, "accessories", "column").rows.map((row) => row.name);
    expect(again).toEqual(names);
  });

  it("reads 1,000 rows in well under a second", () => {
    const lines = Array.from({ length: 1000 }, (_, i) => `Truck ${i},imperial,9900,6400,4800,6000,18000,9000,900,4,2,10000,1000,20.5,5`);
    const csv = ["name,units,gvwr,curb_weight,gawr_front,gawr_rear,gcwr,tow_max,tongue_max,hitch_class,receiver_opening,hitch_gtw,hitch_tw,receiver_height,pin_to_fascia", ...lines].join("\n");
    const started = performance.now();
    const parsed = parseFleetCsv(csv, "vehicles", "column");
    const elapsed = performance.now() - started;
    expect(parsed.validCount).toBe(1000);
    expect(elapsed).toBeLessThan(1000);
  });
});

describe("the form's schema", () => {
  it("reads typed text, drops empty fields and keys errors by the field's path", () => {
    const schema = profileFormSchema("vehicles");
    const ok = schema.safeParse({ name: " Van 3 ", units: "imperial", vehicle: { gvwr: "9,000", curbWeight: "" }, hitch: { class: "3", receiverSize: "2" } });
    expect(ok.success && ok.data).toEqual({ name: "Van 3", units: "imperial", vehicle: { gvwr: 9000 }, hitch: { class: 3, receiverSize: "2" } });
    const bad = schema.safeParse({ name: "", units: "metric", vehicle: { gvwr: "abc" }, hitch: { receiverHeight: "2000" } });
    expect(bad.success).toBe(false);
    const paths = bad.success ? [] : bad.error.issues.map((issue) => issue.path.join("."));
    expect(paths.sort()).toEqual(["hitch.receiverHeight", "name", "vehicle.gvwr"]);
  });
});
