/** SWR keys of the fleet's JSON routes, so a mutation refreshes the right list. */
import type { ProfileKind } from "./fields";

export const fleetListKey = (kind: ProfileKind, archived: "exclude" | "include" | "only" = "exclude") =>
  `/api/v1/fleet/${kind}?archived=${archived}`;

/** The pairings page's vehicles per page and trailers and accessories per page (the page and the grid share them). */
export const MATRIX_PAGE_SIZE = 25;
export const MATRIX_COL_PAGE_SIZE = 8;

export const fleetMatrixKey = (params: Record<string, string | number | undefined>) => {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value !== undefined && value !== "") search.set(key, String(value));
  const query = search.toString();
  return `/api/v1/fleet/matrix${query ? `?${query}` : ""}`;
};
