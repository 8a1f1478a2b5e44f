// @vitest-environment happy-dom
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { cleanup, render, screen, within } from "@testing-library/react";
import { evaluateRig, parseRig, type RigInput, type RigResult } from "@/lib/towing";
import { ResultReport, type ResultReportProps } from "@/components/report/result-report";
import { ReportGone } from "@/components/report/report-gone";
import { describeRig } from "@/components/report/rig-summary";
import { CHECK_WORDS } from "@/lib/glossary";
import { zeroScale } from "@/components/report/chart-scale";
import { formatMargin, formatQuantity } from "@/lib/format";

afterEach(cleanup);

const ROOT = join(import.meta.dirname, "../../..");

function fixture(name: string): Record<string, unknown> {
  return JSON.parse(readFileSync(join(ROOT, "tests/fixtures/rigs", `${name}.json`), "utf8")) as Record<string, unknown>;
}

function rigFrom(value: unknown): RigInput {
  const parsed = parseRig(value);
  if (!parsed.ok) throw new Error(`fixture does not parse: ${JSON.stringify(parsed.fieldErrors)}`);
  return parsed.rig;
}

function evaluated(value: unknown): { rig: RigInput; result: RigResult } {
  const rig = rigFrom(value);
  return { rig, result: evaluateRig(rig) };
}

/** A copy of a fixture with some fields changed (dotted paths); `undefined` removes the field. */
function variant(name: string, changes: Record<string, unknown>): Record<string, unknown> {
  const copy = structuredClone(fixture(name));
  for (const [path, value] of Object.entries(changes)) {
    const keys = path.split(".");
    let node = copy as Record<string, unknown>;
    for (const key of keys.slice(0, -1)) node = node[key] as Record<string, unknown>;
    const last = keys[keys.length - 1]!;
    if (value === undefined) delete node[last];
    else node[last] = value;
  }
  return copy;
}

// Midday UTC so the calendar date is the same in every time zone the tests may run in.
const SAVED = new Date("2026-12-01T12:00:00Z");

function renderReport(value: unknown, extra: Partial<ResultReportProps> = {}) {
  const { rig, result } = evaluated(value);
  const view = render(
    <ResultReport shopName="Quillfeather Hitch Works" createdAt={SAVED} customerName="Odile Marrow" rig={rig} result={result} {...extra} />,
  );
  return { ...view, rig, result };
}

function checkItem(title: string): HTMLElement {
  const heading = screen.getByRole("heading", { level: 3, name: title });
  const item = heading.closest("li");
  if (!item) throw new Error(`no list item around ${title}`);
  return item as HTMLElement;
}

describe("ResultReport header and verdict", () => {
  it("shows the shop's name, the date and the customer's name", () => {
    renderReport(fixture("camper-on-pickup"));
    expect(screen.getByRole("heading", { level: 1, name: "Quillfeather Hitch Works" })).toBeTruthy();
    const time = screen.getByText("1 Dec 2026");
    expect(time.tagName).toBe("TIME");
    expect(time.getAttribute("dateTime")).toBe("2026-12-01T12:00:00.000Z");
    expect(screen.getByText("Prepared for Odile Marrow")).toBeTruthy();
    expect(screen.getByRole("button", { name: "Print" }).className).toContain("no-print");
  });

  it("leaves out the customer line when no name was given", () => {
    renderReport(fixture("camper-on-pickup"), { customerName: null });
    expect(screen.queryByText(/Prepared for/)).toBeNull();
  });

  it("states the verdict in a word, the core's sentence and what the level means", () => {
    const { rig, result } = evaluated(fixture("camper-on-pickup"));
    // A saved snapshot whose verdict is tight: the page shows it as saved, whatever the core says today.
    const tight: RigResult = {
      ...result,
      verdict: {
        ...result.verdict,
        level: "tight",
        levelFromCheckedOnly: "tight",
        complete: true,
        incomplete: [],
        message: "Tight: Loaded and hitched, the vehicle weighs 6,450 lb of its 7,000 lb GVWR, leaving 550 lb.",
      },
    };
    render(<ResultReport shopName="Quillfeather Hitch Works" createdAt={SAVED} rig={rig} result={tight} />);
    const verdict = screen.getByRole("region", { name: "Verdict" });
    expect(verdict.querySelector('[data-status="tight"]')?.textContent).toBe("Tight");
    // The badge already says "Tight"; the sentence carries the rest of the message.
    expect(within(verdict).getByText("Loaded and hitched, the vehicle weighs 6,450 lb of its 7,000 lb GVWR, leaving 550 lb.")).toBeTruthy();
    expect(within(verdict).getByText("Tight: it fits, with less than 10 % left on at least one rating; weigh the loaded rig before you rely on it.")).toBeTruthy();
  });

  it("explains the level the core gave, with the core's own sentence", () => {
    const { result } = renderReport(fixture("boat-on-suv"));
    const { level, message } = result.verdict;
    const word = { within: "Within", tight: "Tight", adjust: "Adjust the set-up", over: "Over: do not tow", incomplete: "Not confirmed" }[level];
    const verdict = screen.getByRole("region", { name: "Verdict" });
    expect(verdict.querySelector(`[data-status="${level}"]`)?.textContent).toBe(word);
    const sentence = message.replace(/^(Over|Tight|Within|Not confirmed|Adjust the set-up before towing): /, "");
    expect(within(verdict).getByText(sentence.charAt(0).toUpperCase() + sentence.slice(1))).toBeTruthy();
    expect(within(verdict).getByText(/^(Within|Tight|Over|Adjust the set-up|Not confirmed yet): /)).toBeTruthy();
  });

  it("says a rig with room everywhere is within", () => {
    const { rig, result } = evaluated(fixture("boat-on-suv"));
    const roomy: RigResult = {
      ...result,
      verdict: { ...result.verdict, level: "within", levelFromCheckedOnly: "within", complete: true, incomplete: [], message: "Within: every check passes with at least 10 % to spare." },
    };
    render(<ResultReport shopName="Quillfeather Hitch Works" createdAt={SAVED} rig={rig} result={roomy} />);
    const verdict = screen.getByRole("region", { name: "Verdict" });
    expect(within(verdict).getByText("Every check passes with at least 10 % to spare.")).toBeTruthy();
    expect(within(verdict).getByText("Within: every rating checked has room to spare, at least 10 % on each.")).toBeTruthy();
  });

  it("says a rig is over and must not be towed like this", () => {
    const { result } = renderReport(variant("camper-on-pickup", { "trailer.grossTrailerWeight": 9600 }));
    expect(result.verdict.level).toBe("over");
    const verdict = screen.getByRole("region", { name: "Verdict" });
    expect(verdict.querySelector('[data-status="over"]')?.textContent).toBe("Over: do not tow");
    expect(
      within(verdict).getByText("Rating exceeded. A rating is exceeded: do not tow like this. It needs a lighter load, or another vehicle or part."),
    ).toBeTruthy();
  });

  it("says a set-up to adjust apart from a rating exceeded", () => {
    // Geometry: lowest point 12 − 3 = 9 in up, 34 + 30 = 64 in behind the axle: atan(9 / 64) = 8.0°, below the
    // hatchback's 20° departure angle (49 CFR 523.2): a raised shank to fit, not a rating exceeded
    const { result } = renderReport(fixture("bike-rack-on-small-car"));
    expect(result.verdict.level).toBe("adjust");
    const verdict = screen.getByRole("region", { name: "Verdict" });
    expect(verdict.querySelector('[data-status="adjust"]')?.textContent).toBe("Adjust the set-up");
    expect(
      within(verdict).getByText("Set-up to adjust. No rating is exceeded, but the set-up needs adjusting before you drive. See what to do under each check."),
    ).toBeTruthy();
    expect(verdict.textContent).not.toMatch(/Rating exceeded|do not tow like this/);
    const item = checkItem(CHECK_WORDS["accessory-fit"].title);
    expect(within(item).getByRole("heading", { level: 4, name: /^Adjust before you drive/ })).toBeTruthy();
    expect(within(item).getByTestId("finding-meaning").textContent).toMatch(/needs a different set-up before you drive/);
  });

  it("says an over rig also needs its set-up adjusted", () => {
    const { result } = renderReport(variant("camper-on-pickup", { "trailer.grossTrailerWeight": 9600, "ballMount.drop": 0 }));
    expect(result.verdict.level).toBe("over");
    expect(result.verdict.adjust).toContain("ball-mount");
    expect(screen.getByRole("region", { name: "Verdict" }).textContent).toMatch(/The set-up also needs adjusting before you tow: .*ball/);
  });

  it("calls a rig whose only problem is its set-up a set-up to adjust, never a rating exceeded", () => {
    // A 6 in drop mount where a 3 in drop levels the trailer: 3 in off level, beyond the 1 in allowance
    // (common practice, no published source); every rating still has room.
    const { result } = renderReport(variant("camper-on-pickup", { "ballMount.drop": 6 }));
    expect(result.checks.filter((c) => c.status === "over")).toEqual([]);
    expect(result.checks.filter((c) => c.status === "adjust").map((c) => c.id)).toEqual(["ball-mount"]);
    const verdict = screen.getByRole("region", { name: "Verdict" });
    expect(verdict.textContent).not.toMatch(/Rating exceeded|A rating is exceeded/);
    expect(verdict.textContent).toContain("Set-up to adjust. No rating is exceeded");
    const item = checkItem(CHECK_WORDS["ball-mount"].title);
    expect(within(item).getByTestId("finding-meaning").textContent).toMatch(/ball mount with another rise or drop/);
  });

  it("says what a share outside its band means for the customer, without calling it a rating", () => {
    // 500 lb on a 6,200 lb trailer is 8.1 %, under the 10–15 % band (Source: GM and Nissan owner's manuals)
    const { result } = renderReport(variant("camper-on-pickup", { "trailer.tongueWeight": 500 }));
    expect(result.checks.find((c) => c.id === "tongue-share")?.status).toBe("adjust");
    const item = checkItem(CHECK_WORDS["tongue-share"].title);
    expect(within(item).getByTestId("finding-meaning").textContent).toMatch(/outside its band: the trailer needs loading differently/);
    expect(item.textContent).not.toMatch(/rating is exceeded/i);
  });

  it("defines the words the page uses, from the one glossary", () => {
    renderReport(fixture("camper-on-pickup"));
    const words = screen.getByRole("region", { name: "Words on this page" });
    expect(words.textContent).toContain("GCWR (gross combined weight rating)");
    expect(words.textContent).toContain("Weight distribution (WD)");
    expect(words.querySelector("#term-gvwr")).toBeTruthy();
  });

  it("names, in plain words, the checks that lacked data", () => {
    const { result } = renderReport(variant("camper-on-pickup", { "vehicle.gcwr": undefined }));
    expect(result.verdict.complete).toBe(false);
    expect(result.verdict.incomplete).toContain("combined-weight");
    const verdict = screen.getByRole("region", { name: "Verdict" });
    expect(verdict.textContent).toMatch(/could not be done because figures are missing: .*vehicle and trailer together/);
    const item = checkItem(CHECK_WORDS["combined-weight"].title);
    expect(within(item).getByText("Not enough data")).toBeTruthy();
    // The check points to the one list; the figure itself is named there, once.
    expect(within(item).getByTestId("waits-for").textContent).toMatch(/Waits for one figure/);
    expect(item.textContent).not.toContain("(GCWR)");
    const list = screen.getByRole("region", { name: "Still to measure" });
    expect(list.querySelectorAll('[data-field="vehicle.gcwr"]')).toHaveLength(1);
    expect(list.textContent).toContain("(GCWR)");
  });

  it("lists each missing figure once on the page, not under each check again", () => {
    renderReport(variant("camper-on-pickup", { "vehicle.gcwr": undefined, "vehicle.wheelbase": undefined }));
    const page = document.body.textContent ?? "";
    const wheelbase = "The wheelbase, front axle centre to rear axle centre";
    expect(page.split(wheelbase).length - 1).toBe(1);
  });

  it("speaks of driving, not towing, on a rack's page", () => {
    renderReport(fixture("bike-rack-on-small-car"));
    expect(screen.getByRole("region", { name: /Before you drive/ })).toBeTruthy();
    expect(document.body.textContent).not.toMatch(/before you tow/i);
  });
});

describe("ResultReport rig and checks", () => {
  it("describes the rig in words with the gross trailer weight and its unit", () => {
    renderReport(fixture("camper-on-pickup"));
    const rig = within(screen.getByRole("region", { name: "The rig" })).getByText(/^A travel trailer/);
    expect(rig.textContent).toMatch(/^A travel trailer of 6,200 lb gross, 800 lb on the tongue \(weighed\), on a vehicle rated to tow 5,000 lb, or 9,000 lb with weight distribution, through a class 4 hitch with a 2 in receiver\./);
    expect(rig.textContent).toContain("A weight-distribution hitch is used.");
  });

  it("mentions only what was given", () => {
    const bare = rigFrom({ units: "imperial", vehicle: {}, trailer: { type: "utility", grossTrailerWeight: 1800 } });
    expect(describeRig(bare)).toBe("A utility trailer of 1,800 lb gross.");
  });

  it("shows each applicable check with its plain title and status word, and no check that does not apply", () => {
    const { result } = renderReport(fixture("camper-on-pickup"));
    const list = screen.getByRole("region", { name: "Each check" });
    const items = within(list).getAllByRole("heading", { level: 3 });
    expect(items).toHaveLength(result.checks.length);
    for (const check of result.checks) {
      const item = checkItem(CHECK_WORDS[check.id].title);
      expect(item.getAttribute("data-status")).toBe(check.status);
      const badge = item.querySelector(`[data-status="${check.status}"]:not(li)`);
      expect(badge?.textContent, check.id).toBe({ within: "Within", tight: "Tight", adjust: "Adjust the set-up", over: "Over", incomplete: "Not enough data" }[check.status]);
      expect(within(item).getByText(CHECK_WORDS[check.id].line)).toBeTruthy();
    }
    expect(result.notApplicable).toContain("accessory-fit");
    expect(screen.queryByRole("heading", { name: CHECK_WORDS["accessory-fit"].title })).toBeNull();
  });

  it("shows actual against limit and the margin", () => {
    const { result } = renderReport(fixture("camper-on-pickup"));
    const check = result.checks.find((c) => c.id === "combined-weight")!;
    expect(check.actual && check.limit && check.margin).toBeTruthy();
    const item = checkItem(CHECK_WORDS["combined-weight"].title);
    expect(within(item).getByText(formatQuantity(check.actual))).toBeTruthy();
    expect(within(item).getByText(formatQuantity(check.limit))).toBeTruthy();
    expect(within(item).getByText(formatMargin(check.margin))).toBeTruthy();
    expect(formatMargin(check.margin)).toMatch(/^[+−][\d,]+ lb \([+−][\d.]+ %\)$/);
    expect(within(item).getByText("Limit").textContent).toBe("Limit: GCWR");
  });

  it("marks the governing rating of each kind in words", () => {
    const { result } = renderReport(fixture("camper-on-pickup"));
    const item = checkItem(CHECK_WORDS["weakest-link"].title);
    const marks = within(item).getAllByText("(lowest — this one decides)");
    expect(marks).toHaveLength(2);
    const marked = marks.map((mark) => mark.parentElement?.textContent);
    expect(marked).toContain("Safety chain rating (each chain)(lowest — this one decides)");
    expect(marked).toContain("Vehicle tongue-weight limit with weight distribution(lowest — this one decides)");
    // The check's own governing item is the one of the two with the least room.
    expect(result.checks.find((check) => check.id === "weakest-link")?.governing?.id).toBe("vehicle.tongueWeightLimitWd");
  });

  it("puts what to do right under a problem", () => {
    renderReport(fixture("bike-rack-on-small-car"));
    const item = checkItem(CHECK_WORDS["accessory-fit"].title);
    expect(item.getAttribute("data-status")).toBe("adjust");
    const advice = within(item).getByRole("heading", { level: 4, name: /^Adjust before you drive/ }).parentElement!;
    expect(advice.textContent).toContain("shank rise");
    // Problems come first in the list.
    const first = within(screen.getByRole("region", { name: "Each check" })).getAllByRole("heading", { level: 3 })[0];
    expect(first?.textContent).toBe(CHECK_WORDS["accessory-fit"].title);
  });

  it("describes an accessory rig in words", () => {
    renderReport(fixture("bike-rack-on-small-car"));
    const rig = within(screen.getByRole("region", { name: "The rig" })).getByText(/^A platform rack/);
    expect(rig.textContent).toMatch(/^A platform rack weighing 45 lb, carrying 70 lb of load centred 14\.0 in behind the hitch pin, through a class 1 hitch with a 1-1\/4 in receiver\./);
  });

  it("shows a metric rig in kg and mm", () => {
    renderReport(fixture("boat-on-suv"));
    const rig = screen.getByRole("region", { name: "The rig" });
    expect(rig.textContent).toContain("A boat trailer of 1,600 kg gross, 150 kg on the tongue (weighed)");
    expect(rig.textContent).toContain("76 mm drop");
    const level = checkItem(CHECK_WORDS["ball-mount"].title);
    expect(within(level).getByText("6 mm")).toBeTruthy();
    expect(document.body.textContent).not.toMatch(/\d lb\b/);
  });
});

describe("ResultReport charts, cautions and footer", () => {
  it("draws each chart with a name and a visible caption, and the limits as lines", () => {
    const { container } = renderReport(fixture("camper-on-pickup"));
    const charts = within(screen.getByRole("region", { name: "At a glance" })).getAllByRole("img");
    expect(charts.map((chart) => chart.getAttribute("aria-label"))).toEqual([
      "Ratings against the load, one row per part",
      "Tongue-weight share 12.9 % against the band of 10 % to 15 %",
      "Axle loads against each axle's rating",
    ]);
    for (const chart of charts) {
      expect(chart.querySelector("title")?.textContent).toBe(chart.getAttribute("aria-label"));
      expect(chart.closest("figure")?.querySelector("figcaption")?.textContent?.length).toBeGreaterThan(20);
    }
    // Eight ratings: eight limit lines, two of them heavy (the lowest of each kind).
    const ratings = charts[0]!;
    const limitLines = [...ratings.querySelectorAll("line.stroke-ink")];
    expect(limitLines).toHaveLength(8);
    expect(limitLines.filter((line) => line.getAttribute("stroke-width") === "3.5")).toHaveLength(2);
    expect(ratings.textContent).toContain("lowest — this one decides");
    expect(container.querySelectorAll("figure")).toHaveLength(3);
  });

  it("draws only the charts the rig has data for", () => {
    renderReport(fixture("bike-rack-on-small-car"));
    const charts = within(screen.getByRole("region", { name: "At a glance" })).getAllByRole("img");
    expect(charts.map((chart) => chart.getAttribute("aria-label"))).toEqual([
      "Accessory load against the hitch's allowance",
      "Axle loads against each axle's rating",
    ]);
    // The load part is tight (its lever effect, a convention, passes the rating) and the ground part needs adjusting
    expect(charts[0]!.textContent).toContain("Tight");
  });

  it("always shows the cautions", () => {
    const { result } = renderReport(fixture("boat-on-suv"));
    const cautions = screen.getByRole("region", { name: "Before you tow" });
    expect(result.verdict.cautions.length).toBeGreaterThanOrEqual(5);
    for (const caution of result.verdict.cautions) expect(within(cautions).getByText(caution)).toBeTruthy();
    expect(cautions.textContent).toMatch(/lowest rating/);
    expect(cautions.textContent).toMatch(/torque/);
    expect(cautions.textContent).toMatch(/qualified installer/);
  });

  it("still shows cautions when a saved result carries none", () => {
    const { rig, result } = evaluated(fixture("boat-on-suv"));
    render(
      <ResultReport shopName="Quillfeather Hitch Works" createdAt={SAVED} rig={rig} result={{ ...result, verdict: { ...result.verdict, cautions: [] } }} />,
    );
    const cautions = screen.getByRole("region", { name: "Before you tow" });
    expect(within(cautions).getAllByRole("listitem").length).toBeGreaterThanOrEqual(5);
    expect(cautions.textContent).toMatch(/weigh the loaded rig/i);
  });

  it("names the core version and prints the QR and link on paper", () => {
    const { result, container } = renderReport(fixture("camper-on-pickup"), {
      qrSvg: '<svg data-qr="yes" viewBox="0 0 4 4"><rect width="4" height="4"/></svg>',
      linkUrl: "https://towmargin.example/r/abc123",
    });
    expect(screen.getByText(new RegExp(`Computed by Towmargin core ${result.coreVersion.replace(/\./g, "\\.")}`))).toBeTruthy();
    expect(container.querySelector('[data-qr="yes"]')).toBeTruthy();
    expect(screen.getByText("https://towmargin.example/r/abc123")).toBeTruthy();
  });
});

describe("ReportGone", () => {
  it.each([
    ["revoked", "This report link has been switched off"],
    ["expired", "This report link has expired"],
    ["not-found", "This link does not lead to a report"],
  ] as const)("explains a %s link and what to do, showing no data", (reason, title) => {
    const { container } = render(<ReportGone reason={reason} />);
    expect(screen.getByRole("heading", { level: 1, name: title })).toBeTruthy();
    expect(screen.getByText(/Ask the shop that checked your rig for a new link/)).toBeTruthy();
    expect(container.textContent).not.toMatch(/\d/);
  });
});

describe("chart scale", () => {
  it("starts at zero and covers the largest value with round steps", () => {
    expect(zeroScale(7280)).toEqual({ top: 8000, ticks: [0, 2000, 4000, 6000, 8000] });
    expect(zeroScale(936)).toEqual({ top: 1000, ticks: [0, 250, 500, 750, 1000] });
    expect(zeroScale(0).ticks[0]).toBe(0);
  });
});

describe("the customer's page stays light", () => {
  function files(dir: string): string[] {
    return readdirSync(dir).flatMap((name) => {
      const path = join(dir, name);
      return statSync(path).isDirectory() ? files(path) : /\.(ts|tsx)$/.test(name) ? [path] : [];
    });
  }
  const sources = files(join(ROOT, "components/report"));

  it("imports nothing but types from the calculation core", () => {
    expect(sources.length).toBeGreaterThan(3);
    let seen = 0;
    for (const file of sources) {
      const text = readFileSync(file, "utf8");
      // Whole statements, so an import written over several lines is read from its first word.
      const statements = text.match(/^(?:import|export)\b[^;]*?from\s*["']@\/lib\/towing[^"']*["']/gms) ?? [];
      seen += statements.length;
      for (const statement of statements) {
        expect(/^(import|export) type\b/.test(statement), `${file}: ${statement.split("\n")[0]}`).toBe(true);
      }
      expect(text, file).not.toMatch(/import\(\s*["']@\/lib\/towing/);
      expect(text, file).not.toMatch(/^import\s+["']@\/lib\/towing/m);
      expect(text, file).not.toMatch(/from\s+["'](\.\.\/)+lib\/towing/);
      expect(text, file).not.toMatch(/from\s+["'](recharts|swr|mathjs)["']/);
    }
    // The rule is read from real import statements (the report does use the core's types).
    expect(seen).toBeGreaterThan(3);
  });

  it("has exactly one client component, the print button", () => {
    const client = sources.filter((file) => /^\s*["']use client["']/.test(readFileSync(file, "utf8")));
    expect(client.map((file) => file.split("/").pop())).toEqual(["print-button.tsx"]);
  });
});
