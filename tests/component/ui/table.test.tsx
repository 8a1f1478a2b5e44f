// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from "vitest";
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { EmptyRow, Table, TBody, TD, TH, THead, TR, type SortDirection } from "@/components/ui/table";

afterEach(cleanup);

function RatingsTable({ sort, onSort, rows }: { sort?: SortDirection; onSort?: () => void; rows: [string, string][] }) {
  return (
    <Table caption="Ratings on this rig">
      <THead>
        <TR>
          <TH>Rating</TH>
          <TH numeric sort={sort} onSort={onSort}>
            Limit
          </TH>
        </TR>
      </THead>
      <TBody>
        {rows.length === 0 ? (
          <EmptyRow colSpan={2}>No ratings yet. Add the vehicle first.</EmptyRow>
        ) : (
          rows.map(([name, limit]) => (
            <TR key={name}>
              <TD>{name}</TD>
              <TD numeric>{limit}</TD>
            </TR>
          ))
        )}
      </TBody>
    </Table>
  );
}

describe("Table", () => {
  it("is a named table inside a keyboard-scrollable region", () => {
    render(<RatingsTable rows={[["Hitch", "3,500 lb"]]} />);
    const table = screen.getByRole("table", { name: "Ratings on this rig" });
    const region = screen.getByRole("region", { name: "Ratings on this rig" });
    expect(region.contains(table)).toBe(true);
    expect(region.tabIndex).toBe(0);
    expect(within(table).getByRole("cell", { name: "3,500 lb" })).toBeTruthy();
  });

  it.each<[SortDirection, string]>([
    ["ascending", "ascending"],
    ["descending", "descending"],
    ["none", "none"],
  ])("sets aria-sort=%s on a sorted heading", (sort, expected) => {
    render(<RatingsTable sort={sort} rows={[]} />);
    expect(screen.getByRole("columnheader", { name: "Limit" }).getAttribute("aria-sort")).toBe(expected);
  });

  it("leaves aria-sort off a heading that cannot be sorted", () => {
    render(<RatingsTable rows={[]} />);
    expect(screen.getByRole("columnheader", { name: "Rating" }).hasAttribute("aria-sort")).toBe(false);
    expect(screen.getByRole("columnheader", { name: "Limit" }).hasAttribute("aria-sort")).toBe(false);
  });

  it("makes a sortable heading a button that asks for the sort", async () => {
    const onSort = vi.fn();
    render(<RatingsTable sort="ascending" onSort={onSort} rows={[]} />);
    const header = screen.getByRole("columnheader", { name: "Limit" });
    await userEvent.click(within(header).getByRole("button", { name: "Limit" }));
    expect(onSort).toHaveBeenCalledTimes(1);
  });

  it("says so across the whole row when there is nothing to list", () => {
    render(<RatingsTable rows={[]} />);
    const cell = screen.getByRole("cell", { name: "No ratings yet. Add the vehicle first." });
    expect(cell.getAttribute("colspan")).toBe("2");
  });
});
