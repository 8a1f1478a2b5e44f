import { readFileSync } from "node:fs";
import { beforeAll, describe, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-bad-input-ft-${process.pid}-${Date.now()}.db`;
  process.env.SMTP_PORT = "9";
  process.env.UPLOAD_DIR = `${process.env.TMPDIR ?? "/tmp"}/towmargin-bad-input-uploads-${process.pid}`;
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import * as fleetActions from "@/app/(workspace)/fleet/actions";
import * as training from "@/app/(workspace)/training/actions";
import * as fleetProfileRoute from "@/app/api/v1/fleet/[kind]/[id]/route";
import * as fleetExportRoute from "@/app/api/v1/fleet/[kind]/export/route";
import * as fleetKindRoute from "@/app/api/v1/fleet/[kind]/route";
import * as fleetTemplateRoute from "@/app/api/v1/fleet/[kind]/template/route";
import * as fleetDocumentRoute from "@/app/api/v1/fleet/documents/[id]/route";
import * as fleetDocumentsRoute from "@/app/api/v1/fleet/documents/route";
import * as fleetImportRoute from "@/app/api/v1/fleet/import/route";
import * as fleetMatrixRoute from "@/app/api/v1/fleet/matrix/route";
import * as lessonRoute from "@/app/api/v1/training/lessons/[id]/route";
import * as resultsRoute from "@/app/api/v1/training/results/route";
import { getDb } from "@/db/client";
import { vehicleProfiles } from "@/db/schema";
import { newId } from "@/lib/server/tokens";
import { copyLibraryExample, createCourse, setLessonVisibility } from "@/lib/server/training";
import { libraryExample } from "@/lib/training/library";
import { OWNER_OF_A } from "./support/access-matrix";
import { fromAction, fromResponse, initialFormState, runCorpus, type FieldSpec, type Target } from "./support/bad-input-harness";
import { buildFixture, ORG_A } from "./support/fixture";

/**
 * The same corpus as bad-input.test.ts, sent to the fleet's and training's routes and actions, whose owners
 * added them while it was being written.
 */
const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));
const example = libraryExample("tongue-load-on-the-axles")!;
let vehicleId = "";
let lessonId = "";
let courseId = "";

/** What a URL segment or query value would carry: text (an object cannot reach a route's params). */
const str = (value: unknown) => (value === undefined ? "" : value !== null && typeof value === "object" ? "[object]" : String(value));
const request = (path: string, init?: RequestInit) => new Request(`http://t${path}`, init);
const params = <T extends Record<string, string>>(values: T) => ({ params: Promise.resolve(values) });
const lessonFields: FieldSpec[] = [
  { path: "title", kind: "requiredText", required: true },
  { path: "story", kind: "requiredText", required: true },
  { path: "question", kind: "requiredText", required: true },
  { path: "rule", kind: "requiredText", required: true },
  { path: "checkId", kind: "enum", required: true },
  // The rig as pasted JSON text: no corpus text is a valid rig.
  { path: "rig", kind: "enum", required: true },
];
const lessonBase = () => ({ title: example.title, story: example.story, question: example.question, rule: example.rule, checkId: example.checkId, rig: JSON.stringify(example.rig) });
const trainingForm = (name: string, run: (form: FormData) => Promise<unknown>, fields: FieldSpec[], base: () => Record<string, unknown>): Target => ({
  name,
  actor: "trainerA",
  transport: "form",
  fields,
  base,
  call: (input) => fromAction(() => run(input as FormData) as never),
});
const multipart = (values: Record<string, unknown>, file: File) => {
  const data = new FormData();
  for (const [key, value] of Object.entries(values)) if (value !== undefined) data.set(key, str(value));
  data.set("file", file);
  return data;
};

const TARGETS: Target[] = [
  trainingForm("create a lesson", (f) => training.createLessonAction(initialFormState, f), lessonFields, lessonBase),
  trainingForm("edit a lesson", (f) => training.updateLessonAction(initialFormState, f), [{ path: "lessonId", kind: "entityId", required: true }, ...lessonFields], () => ({ lessonId, ...lessonBase() })),
  trainingForm("delete a lesson", (f) => training.deleteLessonAction(initialFormState, f), [{ path: "lessonId", kind: "entityId", required: true }], () => ({ lessonId })),
  trainingForm("copy a library example", (f) => training.copyLibraryAction(initialFormState, f), [{ path: "slug", kind: "entityId", required: true }], () => ({ slug: "riding-level" })),
  trainingForm(
    "set a lesson's visibility",
    (f) => training.setVisibilityAction(initialFormState, f),
    [
      { path: "lessonId", kind: "entityId", required: true },
      { path: "visibility", kind: "enum", required: true },
    ],
    () => ({ lessonId, visibility: "organisation" }),
  ),
  trainingForm(
    "create a course",
    (f) => training.createCourseAction(initialFormState, f),
    [
      { path: "title", kind: "requiredText", required: true },
      { path: "description", kind: "optionalText" },
    ],
    () => ({ title: "Counter basics", description: "" }),
  ),
  trainingForm(
    "edit a course",
    (f) => training.updateCourseAction(initialFormState, f),
    [
      { path: "courseId", kind: "entityId", required: true },
      { path: "title", kind: "requiredText", required: true },
    ],
    () => ({ courseId, title: "Counter basics", description: "" }),
  ),
  trainingForm("delete a course", (f) => training.deleteCourseAction(initialFormState, f), [{ path: "courseId", kind: "entityId", required: true }], () => ({ courseId })),
  trainingForm(
    "add a lesson to a course",
    (f) => training.addCourseLessonAction(initialFormState, f),
    [
      { path: "courseId", kind: "entityId", required: true },
      { path: "lessonId", kind: "entityId", required: true },
    ],
    () => ({ courseId, lessonId }),
  ),
  trainingForm(
    "remove a lesson from a course",
    (f) => training.removeCourseLessonAction(initialFormState, f),
    [
      { path: "courseId", kind: "entityId", required: true },
      { path: "lessonId", kind: "entityId", required: true },
    ],
    () => ({ courseId, lessonId }),
  ),
  trainingForm(
    "move a lesson in a course",
    (f) => training.moveCourseLessonAction(initialFormState, f),
    [
      { path: "courseId", kind: "entityId", required: true },
      { path: "lessonId", kind: "entityId", required: true },
      { path: "direction", kind: "enum", required: true },
    ],
    () => ({ courseId, lessonId, direction: "down" }),
  ),
  {
    name: "submit a practice attempt",
    actor: "staffA",
    transport: "value",
    fields: [
      { path: "lessonId", kind: "entityId", required: true },
      { path: "answers", kind: "object", required: true },
      { path: "choices", kind: "object" },
      // A choice id that is not one of the question's choices (any corpus text) is refused on that question. The
      // base's step answer names no step of the lesson, so every case is refused somewhere and nothing is kept.
      { path: "choices.governs", kind: "enum" },
    ],
    base: () => ({ lessonId, answers: { "front-change": "-275" }, choices: { governs: "level.tolerance", "next-action": "more-drop" } }),
    call: (input) => fromAction(() => training.submitAttemptAction(input)),
  },
  {
    name: "GET /api/v1/training/lessons/[id]",
    actor: "trainerA",
    transport: "value",
    fields: [{ path: "id", kind: "entityId", required: true }],
    base: () => ({ id: lessonId }),
    call: async (input) => fromResponse(await lessonRoute.GET(request("/"), params({ id: str((input as { id?: unknown } | null)?.id) }))),
    fieldErrors: false,
    wholeBody: (body) => ({ id: body }),
  },
  {
    name: "GET /api/v1/training/results",
    actor: "trainerA",
    transport: "query",
    fields: [
      { path: "lessonId", kind: "entityId", accepts: ["empty string"] },
      { path: "userId", kind: "entityId", accepts: ["empty string"] },
    ],
    base: () => ({ lessonId }),
    call: async (query) => fromResponse(await resultsRoute.GET(request(`/api/v1/training/results?${query as string}`))),
    skipBodies: true,
  },
  {
    name: "save a fleet profile",
    actor: "fleetA",
    transport: "value",
    fields: [
      { path: "kind", kind: "enum", required: true },
      { path: "id", kind: "entityId" },
      // The typed values are checked as the form's own fields: errors come keyed by the form's names.
      { path: "values", kind: "object", required: true, errorKey: null },
      { path: "values.name", kind: "requiredText", required: true, errorKey: "name" },
    ],
    base: () => ({ kind: "vehicles", id: vehicleId, values: { name: "Bad-input tow vehicle", units: "imperial", gvwr: "7000" } }),
    call: (input) => fromAction(() => fleetActions.saveProfileAction(input)),
  },
  {
    name: "archive a fleet profile",
    actor: "fleetA",
    transport: "value",
    fields: [
      { path: "kind", kind: "enum", required: true },
      { path: "id", kind: "entityId", required: true },
    ],
    base: () => ({ kind: "vehicles", id: vehicleId, archived: true }),
    call: (input) => fromAction(() => fleetActions.archiveProfileAction(input)),
  },
  {
    name: "delete a vehicle document",
    actor: "fleetA",
    transport: "value",
    fields: [{ path: "id", kind: "entityId", required: true }],
    base: () => ({ id: "no-such-document" }),
    call: (input) => fromAction(() => fleetActions.deleteDocumentAction(input)),
  },
  {
    name: "GET /api/v1/fleet/[kind]",
    actor: "fleetA",
    transport: "value",
    fields: [
      { path: "kind", kind: "enum", required: true },
      { path: "archived", kind: "enum" },
    ],
    base: () => ({ kind: "vehicles", archived: "include" }),
    call: async (input) => {
      const { kind, archived } = (input ?? {}) as Record<string, unknown>;
      return fromResponse(await fleetKindRoute.GET(request(`/api/v1/fleet/x?${new URLSearchParams({ archived: str(archived) })}`), params({ kind: str(kind) })));
    },
    // A kind that is not a list is a 404 with a message; a bad filter is a 400 with its field.
    fieldErrors: false,
  },
  {
    name: "GET /api/v1/fleet/[kind]/[id]",
    actor: "fleetA",
    transport: "value",
    fields: [
      { path: "kind", kind: "enum", required: true },
      { path: "id", kind: "entityId", required: true },
    ],
    base: () => ({ kind: "vehicles", id: vehicleId }),
    call: async (input) => {
      const { kind, id } = (input ?? {}) as Record<string, unknown>;
      return fromResponse(await fleetProfileRoute.GET(request("/"), params({ kind: str(kind), id: str(id) })));
    },
    fieldErrors: false,
  },
  {
    name: "GET /api/v1/fleet/[kind]/export",
    actor: "fleetA",
    transport: "value",
    fields: [
      { path: "kind", kind: "enum", required: true },
      { path: "archived", kind: "enum" },
    ],
    base: () => ({ kind: "vehicles", archived: "include" }),
    call: async (input) => {
      const { kind, archived } = (input ?? {}) as Record<string, unknown>;
      return fromResponse(await fleetExportRoute.GET(request(`/api/v1/fleet/x/export?${new URLSearchParams({ archived: str(archived) })}`), params({ kind: str(kind) })));
    },
    fieldErrors: false,
  },
  {
    name: "GET /api/v1/fleet/[kind]/template",
    actor: "fleetA",
    transport: "value",
    fields: [{ path: "kind", kind: "enum", required: true }],
    base: () => ({ kind: "vehicles" }),
    call: async (input) => fromResponse(await fleetTemplateRoute.GET(request("/"), params({ kind: str((input as { kind?: unknown } | null)?.kind) }))),
    fieldErrors: false,
    wholeBody: (body) => ({ kind: body }),
  },
  {
    name: "GET /api/v1/fleet/matrix",
    actor: "fleetA",
    transport: "query",
    fields: [
      { path: "vehicle", kind: "optionalText" },
      { path: "hitched", kind: "optionalText" },
      { path: "level", kind: "enum", accepts: ["empty string"] },
      { path: "page", kind: "formNumber" },
      { path: "pageSize", kind: "formNumber" },
      { path: "colPage", kind: "formNumber" },
      // Empty means by name, as left out; any other unknown order is a field error.
      { path: "vehicleSort", kind: "enum", accepts: ["empty string"] },
      { path: "hitchedSort", kind: "enum", accepts: ["empty string"] },
    ],
    base: () => ({ level: "over", page: "1", pageSize: "25", colPage: "1", vehicleSort: "capacity-desc", hitchedSort: "weight-desc" }),
    call: async (query) => fromResponse(await fleetMatrixRoute.GET(request(`/api/v1/fleet/matrix?${query as string}`))),
    skipBodies: true,
  },
  {
    name: "POST /api/v1/fleet/import",
    actor: "fleetA",
    transport: "value",
    fields: [
      { path: "kind", kind: "enum", required: true },
      { path: "units", kind: "enum", required: true },
      { path: "mode", kind: "enum", required: true },
    ],
    base: () => ({ kind: "vehicles", units: "imperial", mode: "all-or-nothing" }),
    call: async (input) => {
      const values = input !== null && typeof input === "object" && !Array.isArray(input) ? (input as Record<string, unknown>) : { kind: input };
      const file = new File(["name,gvwr\nBad-input van,7000\n"], "fleet.csv", { type: "text/csv" });
      return fromResponse(await fleetImportRoute.POST(request("/api/v1/fleet/import", { method: "POST", body: multipart(values, file) })));
    },
  },
  {
    name: "POST /api/v1/fleet/documents",
    actor: "fleetA",
    transport: "value",
    fields: [
      // Sent as form text, "true" is a well-formed id of no vehicle: the answer names the vehicle field.
      { path: "vehicleId", kind: "entityId", required: true, errorKey: null },
      { path: "kind", kind: "enum", required: true },
    ],
    base: () => ({ vehicleId, kind: "door-jamb-label" }),
    call: async (input) => {
      const values = input !== null && typeof input === "object" && !Array.isArray(input) ? (input as Record<string, unknown>) : { vehicleId: input };
      const file = new File([new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d, 0x31, 0x2e, 0x34, 0x0a])], "label.pdf", { type: "application/pdf" });
      return fromResponse(await fleetDocumentsRoute.POST(request("/api/v1/fleet/documents", { method: "POST", body: multipart(values, file) })));
    },
  },
  {
    name: "GET /api/v1/fleet/documents/[id]",
    actor: "fleetA",
    transport: "value",
    fields: [{ path: "id", kind: "entityId", required: true }],
    base: () => ({ id: "no-such-document" }),
    call: async (input) => fromResponse(await fleetDocumentRoute.GET(request("/"), params({ id: str((input as { id?: unknown } | null)?.id) }))),
    fieldErrors: false,
    wholeBody: (body) => ({ id: body }),
  },
];

beforeAll(async () => {
  await buildFixture();
  const db = await getDb();
  vehicleId = newId();
  const { name: _name, ...vehicle } = camper.vehicle as Record<string, unknown>;
  await db.insert(vehicleProfiles).values({ id: vehicleId, organisationId: ORG_A, name: "Corpus tow vehicle", units: "imperial", data: { units: "imperial", ...vehicle } });
  const copied = await copyLibraryExample(OWNER_OF_A, "riding-level");
  if (!copied.ok) throw new Error(copied.message);
  lessonId = copied.id;
  // Published, so a learner's attempt reaches the marking (a choice id is checked there against the lesson's own).
  await setLessonVisibility(OWNER_OF_A, lessonId, "organisation");
  courseId = await createCourse(OWNER_OF_A, { title: "Corpus course", description: "" });
});

describe("the bad-input corpus against fleet and training", () => {
  for (const target of TARGETS) {
    it(`${target.name}: refused, nothing written, no internals shown`, () => runCorpus(target));
  }
});
