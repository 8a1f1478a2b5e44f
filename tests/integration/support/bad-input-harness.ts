import { expect } from "vitest";
import { initialFormState, type FormState } from "@/lib/validation/form-state";
import { BODY_CORPUS, FIELD_CORPUS, MISSING, type FieldEntry, type FieldKind } from "./bad-input-corpus";
import { actAs, type Person } from "./fixture";
import { NavigationSignal } from "./next-mocks";
import { snapshotAll, STACK_TRACE } from "./tables";

/**
 * Sends the bad-input corpus to one route or action: every entry into every field it is bad for, then every
 * bad whole body, and collects what went wrong (accepted, a failure, internals shown, no field error).
 */
export { initialFormState };

/** What came back, in one shape for responses, action states, redirects and exceptions. */
export interface Outcome {
  refused: boolean;
  status?: number;
  fieldErrors: Record<string, string[]>;
  text: string;
  threw?: string;
}

export type Transport = "json" | "value" | "form" | "query";

export interface FieldSpec {
  path: string;
  kind: FieldKind;
  required?: boolean;
  /** Corpus labels this field legitimately accepts (an empty expiry means "never"). */
  accepts?: string[];
  /** Where the field's error is reported when not at its path (a form nested in an envelope); null: anywhere. */
  errorKey?: string | null;
}

export interface Target {
  name: string;
  actor: Person | "anonymous";
  transport: Transport;
  fields: FieldSpec[];
  base: () => Record<string, unknown>;
  call: (input: unknown) => Promise<Outcome>;
  /** false where the only input is a hidden token or id: a failed state with a message, no field to mark. */
  fieldErrors?: boolean;
  /** How a whole bad body is passed where the input is not one object (a route's params). */
  wholeBody?: (body: unknown) => unknown;
  /** The query key a bad whole body goes into (query targets). */
  queryKey?: string;
  /** A query whose every key accepts any short text: whole bad bodies say nothing there. */
  skipBodies?: true;
}

export async function fromResponse(response: Response): Promise<Outcome> {
  const text = await response.text();
  let body: { fieldErrors?: Record<string, string[]> } = {};
  try {
    body = JSON.parse(text);
  } catch {
    // not JSON: the checks below fail on it
  }
  return { refused: response.status >= 400 && response.status < 500, status: response.status, fieldErrors: body.fieldErrors ?? {}, text };
}

export async function fromAction(run: () => Promise<FormState | void>): Promise<Outcome> {
  try {
    const state = await run();
    if (!state) return { refused: true, fieldErrors: {}, text: "" };
    return { refused: state.ok === false, fieldErrors: state.fieldErrors ?? {}, text: JSON.stringify(state) };
  } catch (error) {
    if (error instanceof NavigationSignal) return { refused: error.kind !== "redirect" || !!error.url?.startsWith("/sign-in"), fieldErrors: {}, text: error.message };
    return { refused: false, fieldErrors: {}, text: "", threw: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
}

export const toForm = (values: Record<string, unknown>) => {
  const data = new FormData();
  for (const [key, value] of Object.entries(values)) if (value !== undefined) data.set(key, String(value));
  return data;
};

export const jsonRequest = (url: string, body: string) =>
  new Request(url, { method: "POST", body, headers: { "content-type": "application/json", "content-length": String(Buffer.byteLength(body)) } });

const RAW = "\u0000raw\u0000";

function setPath(target: Record<string, unknown>, path: string, value: unknown) {
  const keys = path.split(".");
  let node = target;
  for (const key of keys.slice(0, -1)) {
    if (typeof node[key] !== "object" || node[key] === null) node[key] = {};
    node = node[key] as Record<string, unknown>;
  }
  const last = keys[keys.length - 1]!;
  if (value === MISSING) delete node[last];
  else node[last] = value;
}

/** The input of one case in the target's transport, or null when the entry cannot be carried by it. */
function prepare(target: Target, field: FieldSpec, entry: FieldEntry): unknown {
  const input = target.base();
  const textual = target.transport === "form" || target.transport === "query";
  if (textual) {
    if (entry.js === MISSING) setPath(input, field.path, MISSING);
    else if (entry.formText !== undefined) setPath(input, field.path, entry.formText);
    else if (typeof entry.js === "string" || typeof entry.js === "number") setPath(input, field.path, String(entry.js));
    else return null;
    if (target.transport === "query") {
      const params = new URLSearchParams();
      for (const [key, value] of Object.entries(input)) if (value !== undefined) params.set(key, String(value));
      return params.toString();
    }
    return toForm(input);
  }
  if (target.transport === "value") {
    setPath(input, field.path, entry.js);
    return input;
  }
  if (entry.jsonText !== undefined) {
    setPath(input, field.path, RAW);
    return JSON.stringify(input).replace(JSON.stringify(RAW), entry.jsonText);
  }
  setPath(input, field.path, entry.js);
  return JSON.stringify(input);
}

function applies(target: Target, field: FieldSpec, entry: FieldEntry): boolean {
  if (field.accepts?.includes(entry.label)) return false;
  if (entry.js === MISSING) return !!field.required;
  if (entry.badFor.includes(field.kind)) return true;
  const textKinds: FieldKind[] = ["email", "enum", "entityId", "looseId", "token", "requiredText", "optionalText", "newPassword", "password", "date"];
  return !!entry.nonString && (target.transport === "json" || target.transport === "value") && textKinds.includes(field.kind);
}

/** A field error at the field, below it, or at the part that holds it (a rig's `units` decides its shape). */
function hasErrorFor(fieldErrors: Record<string, string[]>, path: string): boolean {
  return Object.keys(fieldErrors).some((key) => key === path || key.startsWith(`${path}.`) || path.startsWith(`${key}.`) || (key === "rig" && !path.includes(".")));
}

function parsesAsJson(text: string): boolean {
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
}

function problemsOf(target: Target, label: string, outcome: Outcome, expectField: string | null, oversized: boolean): string[] {
  const problems: string[] = [];
  if (outcome.threw) problems.push(`threw ${outcome.threw}`);
  else if (!outcome.refused) problems.push(`accepted (${outcome.status ?? "state"} ${outcome.text.slice(0, 160)})`);
  if (STACK_TRACE.test(outcome.text)) problems.push(`internal detail in the answer: ${outcome.text.slice(0, 160)}`);
  const tooLarge = oversized && outcome.status === 413;
  if (!outcome.threw && outcome.refused && target.fieldErrors !== false && !tooLarge) {
    if (expectField && !hasErrorFor(outcome.fieldErrors, expectField)) problems.push(`no field error for ${expectField}: ${JSON.stringify(outcome.fieldErrors).slice(0, 200)}`);
    if (!expectField && Object.keys(outcome.fieldErrors).length === 0) problems.push(`no field errors: ${outcome.text.slice(0, 160)}`);
  }
  return problems.map((problem) => `${target.name} · ${label}: ${problem}`);
}

/** Runs the whole corpus against one target as its actor; the tables must not change. */
export async function runCorpus(target: Target): Promise<void> {
  await actAs(target.actor);
  const before = await snapshotAll();
  const problems: string[] = [];
  let cases = 0;
  for (const field of target.fields) {
    for (const entry of FIELD_CORPUS) {
      if (!applies(target, field, entry)) continue;
      const input = prepare(target, field, entry);
      if (input === null) continue;
      cases++;
      const oversized = typeof input === "string" && input.length > 64 * 1024;
      // NaN and friends are not JSON at all: the whole body is refused, so any field error will do.
      const expectField = target.transport === "json" && !parsesAsJson(input as string) ? null : field.errorKey === undefined ? field.path : field.errorKey;
      problems.push(...problemsOf(target, `${field.path} = ${entry.label}`, await target.call(input), expectField, oversized));
    }
  }
  for (const body of target.skipBodies ? [] : BODY_CORPUS) {
    let input: unknown;
    if (target.transport === "json") input = body.jsonText;
    else if (target.transport === "value") input = target.wholeBody ? target.wholeBody(body.js) : body.js;
    else if (target.transport === "form") input = toForm(body.form ?? {});
    else input = new URLSearchParams({ [target.queryKey ?? "sort"]: body.jsonText.slice(0, 4000) }).toString();
    cases++;
    const oversized = typeof input === "string" && input.length > 64 * 1024;
    problems.push(...problemsOf(target, `body: ${body.label}`, await target.call(input), null, oversized));
  }
  expect(cases).toBeGreaterThan(0);
  expect(problems, problems.join("\n")).toEqual([]);
  expect(await snapshotAll()).toBe(before);
}
