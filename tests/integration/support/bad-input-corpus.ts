/**
 * The bad-input corpus: values that must never be accepted where they are put, and whole bodies that are not
 * a valid request at all. Each field of each route and action has a kind; an entry lists the kinds it is bad
 * for, so "HTML in a name" (a valid name, rendered escaped) is not sent where it would be accepted.
 */
export type FieldKind =
  | "measure" // a JSON number with a range (weights and lengths of a rig)
  | "formNumber" // a number typed into a form field (coerced from text)
  | "email"
  | "enum"
  | "entityId" // ids of records: letters, digits, _ and -
  | "looseId" // ids checked only for length; a wrong one matches nothing
  | "token" // a link's token (hidden field)
  | "requiredText"
  | "optionalText"
  | "newPassword"
  | "password" // the password typed at sign-in: anything up to 128 characters
  | "date"
  | "object"; // a nested part of a JSON body (the vehicle of a rig)

export const MISSING = Symbol("missing");

export interface FieldEntry {
  label: string;
  /** The value as a JavaScript caller (a server action called by the page) would pass it. */
  js: unknown;
  /** The JSON text put in a request body in its place, when JSON.stringify cannot write it (NaN, 1e309). */
  jsonText?: string;
  /** What a form or query string carries; entries without it and with a non-string js are JSON-only. */
  formText?: string;
  badFor: FieldKind[];
  /** Not a string: bad for every text kind too, in a JSON body or a direct call. */
  nonString?: boolean;
}

const NUMBERS: FieldKind[] = ["measure", "formNumber"];
const SHAPED: FieldKind[] = ["measure", "formNumber", "email", "enum", "entityId", "date"];
const STRINGS: FieldKind[] = ["email", "enum", "entityId", "looseId", "token", "requiredText", "optionalText", "newPassword", "password", "date"];
const MEGABYTE = "x".repeat(1024 * 1024);

export const FIELD_CORPUS: FieldEntry[] = [
  { label: "negative", js: -1, badFor: NUMBERS },
  { label: "large negative", js: -1e6, badFor: NUMBERS },
  { label: "negative zero", js: -0, jsonText: "-0", formText: "-0", badFor: NUMBERS },
  { label: "zero", js: 0, badFor: NUMBERS },
  { label: "NaN", js: NaN, jsonText: "NaN", formText: "NaN", badFor: NUMBERS },
  { label: "1e309 (overflows to Infinity)", js: Infinity, jsonText: "1e309", formText: "1e309", badFor: NUMBERS },
  { label: "-1e309", js: -Infinity, jsonText: "-1e309", formText: "-1e309", badFor: NUMBERS },
  { label: "1e20", js: 1e20, badFor: NUMBERS },
  { label: "1e-300", js: 1e-300, badFor: NUMBERS },
  { label: "400 nines", js: "9".repeat(400), badFor: [...NUMBERS] },
  { label: "number as a string", js: "7000", badFor: ["measure"] },
  { label: "number with a unit", js: "7000 lb", badFor: [...NUMBERS, "enum"] },
  { label: "number with a thousands separator", js: "7,000", badFor: NUMBERS },
  { label: "full-width digits", js: "７０００", badFor: SHAPED },
  { label: "hexadecimal", js: "0x1F40", badFor: ["measure", "email", "enum", "date"] },
  { label: "measure as an object with its unit", js: { value: 7000, unit: "lb" }, badFor: ["measure"], nonString: true },
  { label: "unit name instead of a unit system", js: "lb", badFor: [...NUMBERS, "enum", "email", "date"] },
  { label: "unknown unit system", js: "furlongs", badFor: [...NUMBERS, "enum", "email", "date"] },
  { label: "choice in upper case", js: "OWNER", badFor: [...NUMBERS, "enum", "email", "date"] },
  { label: "true", js: true, formText: "true", badFor: [...NUMBERS, "enum", "email", "date", "object"], nonString: true },
  { label: "null", js: null, formText: "null", badFor: [...NUMBERS, "enum", "email", "date", "object"], nonString: true },
  { label: "empty object", js: {}, badFor: ["measure"], nonString: true },
  { label: "array", js: [7000], badFor: ["measure", "object"], nonString: true },
  { label: "empty array", js: [], badFor: ["measure", "object"], nonString: true },
  { label: "text in place of a part", js: "vehicle", badFor: ["object", "measure", "formNumber", "email", "enum", "date"] },
  { label: "missing", js: MISSING, badFor: [] },
  { label: "empty string", js: "", badFor: ["measure", "formNumber", "email", "enum", "entityId", "looseId", "token", "requiredText", "newPassword", "password", "date", "object"] },
  { label: "whitespace only", js: "   ", badFor: ["measure", "formNumber", "email", "enum", "entityId", "token", "requiredText", "newPassword", "date"] },
  { label: "too short", js: "short", badFor: ["token", "newPassword", "measure", "formNumber", "email", "enum", "date"] },
  { label: "1 MB of text", js: MEGABYTE, badFor: [...STRINGS, ...NUMBERS] },
  { label: "HTML tag", js: "<b>bold</b>", badFor: SHAPED },
  { label: "script element", js: "<script>alert(1)</script>", badFor: SHAPED },
  { label: "attribute breakout", js: '"><img src=x onerror=alert(1)>', badFor: SHAPED },
  { label: "javascript: URL", js: "javascript:alert(1)", badFor: SHAPED },
  { label: "SQL quote and comment", js: "' OR '1'='1' --", badFor: SHAPED },
  { label: "SQL stacked statement", js: "1; DROP TABLE saved_checks;--", badFor: SHAPED },
  { label: "SQL union", js: "x' UNION SELECT password_hash FROM users--", badFor: SHAPED },
  { label: "path traversal", js: "../../etc/passwd", badFor: SHAPED },
  { label: "NUL byte", js: "a\u0000b", badFor: SHAPED },
  { label: "right-to-left override", js: "\u202Egnp.exe", badFor: SHAPED },
  { label: "zero-width spaces", js: "\u200B\u200B", badFor: SHAPED },
  { label: "lone surrogate", js: "\uD800", badFor: SHAPED },
  { label: "combining marks", js: "Z\u0351\u0334\u0338", badFor: SHAPED },
  { label: "emoji", js: "\u{1F69B}\u{1F69B}", badFor: SHAPED },
  { label: "e-mail without a domain", js: "someone@", badFor: ["email", ...NUMBERS] },
  { label: "e-mail with a display name", js: "Some One <one@example.com>", badFor: ["email", ...NUMBERS, "enum", "entityId"] },
  { label: "two e-mails", js: "a@example.com,b@example.com", badFor: ["email", ...NUMBERS, "enum", "entityId"] },
  { label: "date in another format", js: "01/12/2026", badFor: ["date", ...NUMBERS, "enum", "email", "entityId"] },
  { label: "impossible date", js: "2026-13-45", badFor: ["date", "measure", "enum", "email"] },
];

export interface BodyEntry {
  label: string;
  /** The request body's text for a JSON route. */
  jsonText: string;
  /** The value for a direct call (a server action called with an object). */
  js: unknown;
  /** The fields of a form post; omitted: the same as an empty form. */
  form?: Record<string, string>;
}

const nested = (depth: number) => "[".repeat(depth) + "]".repeat(depth);

export const BODY_CORPUS: BodyEntry[] = [
  { label: "null body", jsonText: "null", js: null },
  { label: "array body", jsonText: "[]", js: [] },
  { label: "string body", jsonText: '"a rig"', js: "a rig" },
  { label: "number body", jsonText: "42", js: 42 },
  { label: "empty object", jsonText: "{}", js: {}, form: {} },
  { label: "extra fields only", jsonText: '{"colour":"red","admin":true}', js: { colour: "red", admin: true }, form: { colour: "red", admin: "true" } },
  {
    label: "prototype pollution",
    jsonText: '{"__proto__":{"admin":true},"constructor":{"prototype":{"admin":true}}}',
    js: JSON.parse('{"__proto__":{"admin":true},"constructor":{"prototype":{"admin":true}}}'),
    form: { __proto__: "x", constructor: "y" } as Record<string, string>,
  },
  { label: "deeply nested arrays", jsonText: nested(5000), js: JSON.parse(nested(5000)) },
  { label: "not JSON", jsonText: "{not json", js: "{not json" },
  { label: "truncated JSON", jsonText: '{"units":"imperial","vehicle":{"gvwr":70', js: '{"units":"imperial"' },
  { label: "empty body", jsonText: "", js: undefined },
  { label: "1 MB body", jsonText: JSON.stringify({ padding: MEGABYTE }), js: { padding: MEGABYTE }, form: { padding: MEGABYTE } },
];

export const CORPUS_SIZE = FIELD_CORPUS.length + BODY_CORPUS.length;
