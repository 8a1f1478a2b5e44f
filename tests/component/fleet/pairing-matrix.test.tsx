// @vitest-environment happy-dom
/** The pairings grid while a large fleet's stored verdicts are being rechecked, and once they are ready. */
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { PairingMatrix, type PairingMatrixFilters } from "@/components/fleet/pairing-matrix";
import { fleetMatrixKey, MATRIX_COL_PAGE_SIZE, MATRIX_PAGE_SIZE } from "@/lib/fleet/keys";
import type { MatrixPage } from "@/lib/server/fleet";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const filters = (level: string): PairingMatrixFilters => ({ vehicle: "", hitched: "", level, vehicleSort: "name", hitchedSort: "name" });
const keyOf = (level: string) => fleetMatrixKey({ ...filters(level), page: 1, pageSize: MATRIX_PAGE_SIZE, colPage: 1, colPageSize: MATRIX_COL_PAGE_SIZE });

// An invented page: one truck, one trailer, its pair over by the tow rating.
function page(overrides: Partial<MatrixPage>): MatrixPage {
  return {
    units: "imperial",
    rows: [{ id: "v1", name: "Grid truck 1", cells: [{ level: "over", complete: true, adjust: [], governing: { label: "Vehicle tow rating", value: 5000, unit: "lb", checkId: "ratings" } }] }],
    columns: [{ id: "t1", kind: "trailers", name: "Grid trailer 1", weight: { value: 7000, unit: "lb", basis: "gross" } }],
    vehicleSort: "name",
    hitchedSort: "name",
    page: 1,
    pageCount: 1,
    totalRows: 1,
    colPage: 1,
    colPageCount: 1,
    totalColumns: 1,
    counts: { within: 0, tight: 0, adjust: 0, over: 1, incomplete: 0 },
    rechecking: false,
    evaluated: 0,
    elapsedMs: 3,
    ...overrides,
  };
}

describe("PairingMatrix", () => {
  it("says the pairings are being rechecked, without counts, and that the verdict filter waits for it", () => {
    // The page asks again while rechecking: the answer stays the same here.
    vi.stubGlobal("fetch", vi.fn(async () => new Response(JSON.stringify(page({ rechecking: true, counts: null, rows: [], columns: [], totalRows: 0, totalColumns: 0 })))));
    const initial = page({ rechecking: true, counts: null, rows: [], columns: [], totalRows: 0, totalColumns: 0 });
    render(<PairingMatrix initial={initial} initialKey={keyOf("over")} initialFilters={filters("over")} cautions={["Weigh the loaded rig."]} />);
    expect(screen.getByRole("status").textContent).toMatch(/Being rechecked after a change/);
    expect(screen.getByText("The verdict filter is waiting for the recheck to finish.")).toBeTruthy();
    expect(screen.queryByText(/\d+ over/)).toBeNull();
    expect(screen.queryByText(/No pairings match/)).toBeNull();
  });

  it("once ready, shows the counts and each pair, and no recheck notice", () => {
    render(<PairingMatrix initial={page({})} initialKey={keyOf("")} initialFilters={filters("")} cautions={["Weigh the loaded rig."]} />);
    expect(screen.queryByTestId("pairings-rechecking")).toBeNull();
    expect(screen.getByText("1 over")).toBeTruthy();
    expect(screen.getByText("Grid truck 1")).toBeTruthy();
  });
});
