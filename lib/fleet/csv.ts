/**
 * Fleet spreadsheets: the template, the import mapping with each row's errors, and the export. Pure (no
 * server code), so the preview in the browser and the import on the server read a file the same way.
 *
 * Columns are Towmargin's own names (`csvColumns`). Units are stated once for the file or per row in a
 * `units` column (imperial: lb and in; metric: kg and mm); a value that carries a unit of the other system,
 * a column named with a unit, or a figure outside the field's range is an error, never a guess.
 */
import Papa from "papaparse";
import { PROFILE_SCHEMAS, type ProfileInput } from "../validation/fleet";
import { FIELDS_BY_KIND, KIND_WORDS, profileValueText, readValue, unitFor, type ProfileField, type ProfileKind } from "./fields";

export const CSV_MAX_BYTES = 2 * 1024 * 1024;
export const CSV_MAX_ROWS = 5000;

export type UnitsChoice = "imperial" | "metric" | "column";

export interface ImportRowError {
  column: string;
  message: string;
}

export interface ImportRow {
  /** The line in the file (the header is line 1). */
  line: number;
  name: string;
  units?: "imperial" | "metric";
  errors: ImportRowError[];
  /** The valid profile, when the row has no errors. */
  profile?: ProfileInput;
}

export interface ParsedImport {
  kind: ProfileKind;
  fileErrors: string[];
  columns: string[];
  rows: ImportRow[];
  validCount: number;
  errorCount: number;
}

export function csvColumns(kind: ProfileKind): string[] {
  return ["name", "units", ...FIELDS_BY_KIND[kind].map((field) => field.column)];
}

/** Refuses what is not a CSV file before reading it: too big, empty, binary (a photo, a PDF, a spreadsheet archive). */
export function checkCsvBytes(bytes: Uint8Array): string | null {
  if (bytes.byteLength > CSV_MAX_BYTES) {
    return `The file is ${(bytes.byteLength / 1024 / 1024).toFixed(1)} MB; a fleet file may be at most ${CSV_MAX_BYTES / 1024 / 1024} MB. Split it into smaller files.`;
  }
  if (bytes.byteLength === 0) return "The file is empty.";
  const head = bytes.subarray(0, Math.min(bytes.byteLength, 8192));
  const starts = (...signature: number[]) => signature.every((byte, i) => head[i] === byte);
  if (starts(0x50, 0x4b, 0x03, 0x04)) return "This looks like a spreadsheet workbook or an archive, not a CSV file. Save the sheet as CSV (comma-separated) first.";
  if (starts(0x25, 0x50, 0x44, 0x46) || starts(0x89, 0x50, 0x4e, 0x47) || starts(0xff, 0xd8, 0xff) || starts(0x47, 0x49, 0x46, 0x38)) {
    return "This is a PDF or a picture, not a CSV file.";
  }
  if (head.includes(0)) return "This file is not text, so it cannot be a CSV file.";
  try {
    new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return "The file is not UTF-8 text. Save it as \"CSV UTF-8\".";
  }
  return null;
}

export function decodeCsv(bytes: Uint8Array): string {
  return new TextDecoder("utf-8").decode(bytes).replace(/^\uFEFF/, "");
}

const UNIT_WORDS: Record<string, "imperial" | "metric"> = {
  lb: "imperial",
  lbs: "imperial",
  in: "imperial",
  '"': "imperial",
  kg: "metric",
  mm: "metric",
  cm: "metric",
  m: "metric",
};

function readUnits(raw: string | undefined): "imperial" | "metric" | null | undefined {
  const text = raw?.trim().toLowerCase() ?? "";
  if (text === "") return undefined;
  if (text === "imperial" || text === "lb-in" || text === "lb/in") return "imperial";
  if (text === "metric" || text === "kg-mm" || text === "kg/mm") return "metric";
  return null;
}

/** A figure typed with its unit ("3,500 lb"): the number, or an error when the unit is not the row's own. */
function readFigure(field: ProfileField, raw: string, units: "imperial" | "metric"): { value: unknown; error?: string } {
  const match = raw.trim().match(/^([-+]?[\d.,]+)\s*(lbs|lb|kg|mm|cm|in|m|")$/i);
  if (!match || !field.measure || field.measure === "angle" || field.measure === "percent") return { value: readValue(field, raw) };
  const unit = match[2]!.toLowerCase();
  const expected = unitFor(field, units);
  if (unit === expected || (unit === "lbs" && expected === "lb") || (unit === '"' && expected === "in")) {
    return { value: readValue(field, match[1]!) };
  }
  const system = UNIT_WORDS[unit];
  const where = system && system !== units ? `this row is ${units} (${expected})` : `this field is in ${expected}`;
  return { value: undefined, error: `${field.label}: the value is in ${unit} but ${where}. Convert it, or give the row the right units.` };
}

/** Extra checks a wrong unit system often trips even when every figure is inside its range. */
function plausibility(kind: ProfileKind, profile: ProfileInput): ImportRowError[] {
  const errors: ImportRowError[] = [];
  if (kind === "vehicles" && "vehicle" in profile) {
    const v = profile.vehicle;
    if (v.gvwr !== undefined && v.curbWeight !== undefined && v.curbWeight >= v.gvwr) {
      errors.push({ column: "curb_weight", message: "Curb weight is not below the GVWR: check the figures and the file's units." });
    }
    if (v.gvwr !== undefined && v.gcwr !== undefined && v.gcwr < v.gvwr) {
      errors.push({ column: "gcwr", message: "GCWR is below the GVWR: check the figures and the file's units." });
    }
  }
  if (kind === "trailers" && "trailer" in profile) {
    const t = profile.trailer;
    if (t.grossTrailerWeight !== undefined && t.tongueWeight !== undefined && t.tongueWeight >= t.grossTrailerWeight) {
      errors.push({ column: "tongue_weight", message: "Tongue weight is not below the gross trailer weight: check the figures and the file's units." });
    }
  }
  return errors;
}

export interface ParseOptions {
  /** Names already in the organisation (any case): a row with one of them is refused as a duplicate. */
  existingNames?: Iterable<string>;
}

/**
 * Reads a fleet CSV into rows with their errors. File problems (no name column, a column of another name,
 * too many rows) come back in `fileErrors` with no rows to import.
 */
export function parseFleetCsv(text: string, kind: ProfileKind, unitsChoice: UnitsChoice, options: ParseOptions = {}): ParsedImport {
  const fields = FIELDS_BY_KIND[kind];
  const byColumn = new Map(fields.map((field) => [field.column, field]));
  const columnOfPath = new Map(fields.map((field) => [field.path, field.column]));
  const known = new Set(csvColumns(kind));
  const result: ParsedImport = { kind, fileErrors: [], columns: [], rows: [], validCount: 0, errorCount: 0 };

  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: "greedy" });
  const [header, ...body] = parsed.data;
  if (!header || header.length === 0) {
    result.fileErrors.push("The file has no header row.");
    return result;
  }
  const columns = header.map((cell) => cell.trim().toLowerCase());
  result.columns = columns;

  const seenColumns = new Set<string>();
  for (const column of columns) {
    if (column === "") {
      result.fileErrors.push("A column has no name in the header row.");
      continue;
    }
    if (seenColumns.has(column)) result.fileErrors.push(`The column "${column}" appears twice.`);
    seenColumns.add(column);
    if (known.has(column)) continue;
    const unitSuffix = column.match(/^(.*?)[_ (-]*(lbs|lb|kg|mm|cm|in)\)?$/);
    if (unitSuffix && known.has(unitSuffix[1]!)) {
      result.fileErrors.push(
        `The column "${column}" names a unit. Units are set once for the file or in a "units" column; call the column "${unitSuffix[1]}".`,
      );
    } else {
      result.fileErrors.push(`"${column}" is not a ${KIND_WORDS[kind].one} column. Use the template's columns: ${csvColumns(kind).join(", ")}.`);
    }
  }
  if (!columns.includes("name")) result.fileErrors.push('The file needs a "name" column.');
  if (unitsChoice === "column" && !columns.includes("units")) {
    result.fileErrors.push('Units were to come from the file, but it has no "units" column. Add one, or choose the units for the whole file.');
  }
  if (body.length > CSV_MAX_ROWS) result.fileErrors.push(`The file has ${body.length} rows; import at most ${CSV_MAX_ROWS} at a time.`);
  if (body.length === 0) result.fileErrors.push("The file has a header but no rows.");
  if (parsed.errors.some((error) => error.type === "Quotes")) result.fileErrors.push("A quoted value is not closed: check the quotes in the file.");
  if (result.fileErrors.length) return result;

  const existing = new Set([...(options.existingNames ?? [])].map((name) => name.trim().toLowerCase()));
  const firstLineOfName = new Map<string, number>();
  const schema = PROFILE_SCHEMAS[kind];

  body.forEach((cells, index) => {
    const line = index + 2;
    const cell = (column: string) => {
      const at = columns.indexOf(column);
      return at === -1 ? undefined : (cells[at] ?? "");
    };
    const errors: ImportRowError[] = [];
    if (cells.length > columns.length && cells.slice(columns.length).some((extra) => extra.trim() !== "")) {
      errors.push({ column: "row", message: `The row has ${cells.length} values for ${columns.length} columns.` });
    }
    const name = unprotectCell(cell("name") ?? "").trim();

    const rowUnits = readUnits(cell("units"));
    let units: "imperial" | "metric" | undefined;
    if (rowUnits === null) {
      errors.push({ column: "units", message: `Units: "${cell("units")}" is not a unit system. Write imperial (lb, in) or metric (kg, mm).` });
    } else if (unitsChoice === "column") {
      if (!rowUnits) errors.push({ column: "units", message: "Units: write imperial or metric for this row." });
      units = rowUnits;
    } else {
      if (rowUnits && rowUnits !== unitsChoice) {
        errors.push({ column: "units", message: `Units: the row says ${rowUnits}, but the file was imported as ${unitsChoice}.` });
      }
      units = unitsChoice;
    }

    const values = new Map<string, unknown>();
    for (const [column, field] of byColumn) {
      const raw = cell(column);
      if (raw === undefined || raw.trim() === "") continue;
      if (!units) continue;
      const figure = readFigure(field, raw, units);
      if (figure.error) errors.push({ column, message: figure.error });
      else values.set(field.path, figure.value);
    }

    const key = name.toLowerCase();
    if (name && firstLineOfName.has(key)) {
      errors.push({ column: "name", message: `The same name as line ${firstLineOfName.get(key)}: each ${KIND_WORDS[kind].one} needs its own name.` });
    } else if (name && existing.has(key)) {
      errors.push({ column: "name", message: `A ${KIND_WORDS[kind].one} named "${name}" is already in the fleet.` });
    }
    if (name && !firstLineOfName.has(key)) firstLineOfName.set(key, line);

    let profile: ProfileInput | undefined;
    if (units) {
      const data = buildFromValues(kind, values);
      const checked = schema.safeParse({ name, units, ...data });
      if (checked.success) {
        profile = checked.data as ProfileInput;
        errors.push(...plausibility(kind, profile));
      } else {
        for (const issue of checked.error.issues) {
          const path = issue.path.map(String).join(".");
          const column = path === "name" || path === "units" ? path : (columnOfPath.get(path) ?? path);
          if (!errors.some((error) => error.column === column)) errors.push({ column, message: issue.message });
        }
      }
    }
    const ok = errors.length === 0 && profile !== undefined;
    result.rows.push({ line, name, units, errors, profile: ok ? profile : undefined });
    if (ok) result.validCount++;
    else result.errorCount++;
  });
  return result;
}

function buildFromValues(kind: ProfileKind, values: Map<string, unknown>): Record<string, unknown> {
  const data: Record<string, unknown> = {};
  for (const field of FIELDS_BY_KIND[kind]) {
    if (!values.has(field.path)) continue;
    const keys = field.path.split(".");
    let node = data;
    for (const key of keys.slice(0, -1)) node = (node[key] ??= {}) as Record<string, unknown>;
    node[keys[keys.length - 1]!] = values.get(field.path);
  }
  const wd = data.weightDistribution as Record<string, unknown> | undefined;
  if (wd && wd.used === undefined) wd.used = true;
  if (kind === "vehicles") data.vehicle ??= {};
  return data;
}

const FORMULA_START = /^[=+\-@\t\r]/;

/** A cell a spreadsheet would run as a formula is kept as text: an apostrophe goes in front. */
function safeCell(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

/** The reverse on import: the apostrophe that protected a formula-looking cell goes; any other stays. */
function unprotectCell(text: string): string {
  return text.startsWith("'") && FORMULA_START.test(text.slice(1)) ? text.slice(1) : text;
}

/** The organisation's profiles of one kind as CSV, in the import's own columns (so an export imports again). */
export function exportFleetCsv(kind: ProfileKind, profiles: Array<{ name: string; units: string; data: unknown }>): string {
  const fields = FIELDS_BY_KIND[kind];
  const rows = profiles.map((profile) => [safeCell(profile.name), profile.units, ...fields.map((field) => profileValueText(field, profile.data))]);
  return Papa.unparse({ fields: csvColumns(kind), data: rows }, { newline: "\r\n" });
}

/** The template: the columns, and one example row of invented figures to show the format. */
export function templateCsv(kind: ProfileKind): string {
  const examples: Record<ProfileKind, Record<string, string>> = {
    vehicles: {
      name: "Crew truck 14", units: "imperial", gvwr: "9900", gawr_front: "4800", gawr_rear: "6000", gcwr: "18000", tow_max: "9000",
      tongue_max: "900", curb_weight: "6400", wheelbase: "160", axle_to_pin: "44", hitch_class: "4", receiver_opening: "2",
      hitch_gtw: "10000", hitch_tw: "1000", receiver_height: "20.5", pin_to_fascia: "5",
    },
    trailers: {
      name: "Mower trailer 3", units: "imperial", trailer_kind: "utility", gross_weight: "3500", tongue_weight: "420",
      tongue_weight_basis: "measured", coupler_height: "17", coupler_rating: "5000", coupler_ball: "2", ball_size: "2", brakes: "none",
    },
    accessories: {
      name: "Tool carrier 1", units: "imperial", accessory_kind: "cargo-carrier", own_weight: "55", load_weight: "250",
      load_centre_from_pin: "22", lowest_below_shank: "3", lowest_behind_pin: "30",
    },
  };
  const columns = csvColumns(kind);
  return Papa.unparse({ fields: columns, data: [columns.map((column) => examples[kind][column] ?? "")] }, { newline: "\r\n" });
}
