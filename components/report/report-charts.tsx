/**
 * The report's charts, each a figure with a visible caption: ratings against the load, the tongue-weight
 * share against its band, and the axle loads against their ratings. Only the charts the result has data for
 * are drawn. Server-rendered SVG; type-only imports from the core.
 */
import type { ReactNode } from "react";
import { formatChange, formatQuantity, formatRatio } from "@/lib/format";
import type { RigInput } from "@/lib/towing/input";
import type {
  AccessoryFitResult,
  AnyCheckResult,
  AxleLoadsResult,
  Link,
  Quantity,
  RigResult,
  TongueShareResult,
  WeakestLinkResult,
} from "@/lib/towing/types";
import { BarRowsChart, type BarGroup } from "./bar-rows-chart";
import { rowStatus } from "./chart-scale";
import { bandEdge, TongueShareChart } from "./tongue-share-chart";
import { GOVERNING_WORDS } from "./check-item";

function find<T extends AnyCheckResult>(result: RigResult, id: T["id"], key: string): T | undefined {
  const check = result.checks.find((c) => c.id === id);
  return check && key in check ? (check as T) : undefined;
}

interface ChartFigure {
  id: string;
  caption: string;
  chart: ReactNode;
}

const LINK_TITLES: Record<Link["limits"], string> = {
  "gross-trailer-weight": "Trailer weight against each rating",
  "tongue-weight": "Tongue weight against each rating",
};

function ratingsFigure(result: RigResult): ChartFigure | null {
  const weakest = find<WeakestLinkResult>(result, "weakest-link", "links");
  if (weakest && weakest.links.length) {
    const governing: Record<Link["limits"], string | undefined> = {
      "gross-trailer-weight": weakest.governingGrossTrailerWeight?.id,
      "tongue-weight": weakest.governingTongueWeight?.id,
    };
    const groups: BarGroup[] = [];
    for (const limits of ["gross-trailer-weight", "tongue-weight"] as const) {
      const links = weakest.links.filter((link) => link.limits === limits);
      if (!links.length) continue;
      const load = links.find((link) => link.actual)?.actual;
      groups.push({
        id: limits,
        title: load ? `${LINK_TITLES[limits]}: ${formatQuantity(load)}` : `${LINK_TITLES[limits]} (weight not given)`,
        rows: links.map((link) => ({
          id: link.id,
          label: link.label,
          load: link.actual,
          limit: link.rating,
          status: link.status,
          governing: link.id === governing[limits],
          valueText: formatQuantity(link.rating),
        })),
      });
    }
    return {
      id: "ratings",
      caption: "Bars: the load as entered. Dark lines: each part's rating; the bar must stop short of every line, and the thickest line, the lowest rating, decides.",
      chart: <BarRowsChart title="Ratings against the load, one row per part" groups={groups} governingNote={GOVERNING_WORDS} />,
    };
  }

  const accessory = find<AccessoryFitResult>(result, "accessory-fit", "parts");
  const weightUnits = new Set(["lb", "kg"]);
  const parts = accessory?.parts.filter((part) => part.actual && part.limit && weightUnits.has(part.limit.unit)) ?? [];
  if (accessory && parts.length) {
    return {
      id: "ratings",
      caption: "The bar is the load the accessory puts on the receiver; the dark line is what the hitch allows for it.",
      chart: (
        <BarRowsChart
          title="Accessory load against the hitch's allowance"
          governingNote={GOVERNING_WORDS}
          groups={[
            {
              id: "accessory",
              title: "The accessory's load on the receiver",
              rows: parts.map((part) => ({
                id: part.id,
                label: `${part.label}: ${formatQuantity(part.actual)}`,
                load: part.actual,
                limit: part.limit!,
                status: part.status,
                valueText: formatQuantity(part.limit),
              })),
            },
          ]}
        />
      ),
    };
  }
  return null;
}

function tongueShareFigure(result: RigResult): ChartFigure | null {
  const check = find<TongueShareResult>(result, "tongue-share", "band");
  if (!check || check.share === undefined) return null;
  const band = `${bandEdge(check.band.min)} to ${bandEdge(check.band.max)}`;
  const source =
    check.band.source === "vehicle" ? "the band the vehicle maker gives" : check.band.source === "hitch-type" ? "the usual pin-weight band for a fifth wheel or gooseneck" : "the usual band for this kind of trailer";
  return {
    id: "tongue-share",
    caption: `The marker is the share of the trailer's weight resting on the hitch, ${formatRatio(check.share)}; the shaded stretch is ${source}, ${band}.`,
    chart: (
      <TongueShareChart
        title={`Tongue-weight share ${formatRatio(check.share)} against the band of ${band}`}
        share={check.share}
        band={check.band}
        status={check.status}
      />
    ),
  };
}

function axleFigure(result: RigResult, rig: RigInput): ChartFigure | null {
  const check = find<AxleLoadsResult>(result, "axle-loads", "id");
  if (!check) return null;
  const loads = check.withWd ?? check.hitched;
  if (!loads) return null;
  const unit: Quantity["unit"] = rig.units === "metric" ? "kg" : "lb";
  const rows = [
    { id: "front", label: "Front axle", load: loads.front, gawr: rig.vehicle.gawrFront, change: check.frontChange },
    { id: "rear", label: "Rear axle", load: loads.rear, gawr: rig.vehicle.gawrRear, change: check.rearChange },
  ].filter((row): row is typeof row & { gawr: number } => row.gawr !== undefined);
  if (!rows.length) return null;
  const changes = rows
    .filter((row) => row.change)
    .map((row) => `${row.label.toLowerCase()} ${formatChange(row.change!)}`);
  const governingId = check.governing?.id;
  return {
    id: "axle-loads",
    caption:
      `Each bar is what the axle carries ${check.withWd ? "with weight distribution engaged" : "once hitched"}; the line is its rating (GAWR).` +
      (changes.length ? ` Hitching changes the load: ${changes.join(", ")}.` : ""),
    chart: (
      <BarRowsChart
        title="Axle loads against each axle's rating"
        governingNote="closest to its rating"
        groups={[
          {
            id: "axles",
            title: "Weight on each axle",
            rows: rows.map((row) => {
              const limit: Quantity = { value: row.gawr, unit };
              return {
                id: row.id,
                label: `${row.label}: ${formatQuantity(row.load)}`,
                load: row.load,
                limit,
                status: rowStatus(row.load.value, row.gawr, result.verdict.tightMarginRatio),
                governing: governingId === (row.id === "front" ? "vehicle.gawrFront" : "vehicle.gawrRear"),
                valueText: formatQuantity(limit),
              };
            }),
          },
        ]}
      />
    ),
  };
}

/** The figures this result has data for, in reading order. */
export function reportFigures(result: RigResult, rig: RigInput): ChartFigure[] {
  return [ratingsFigure(result), tongueShareFigure(result), axleFigure(result, rig)].filter(
    (figure): figure is ChartFigure => figure !== null,
  );
}
