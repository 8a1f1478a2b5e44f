"use client";

/**
 * The verdict's charts, loaded on demand (next/dynamic, no server render) so the check page's first load
 * stays light. Each one: a text title, an aria-label that says what it shows, direct labels instead of a
 * legend, limits as lines, weight axes from zero, a fixed height.
 */
import { memo, useLayoutEffect, useRef, useState, type ReactNode } from "react";
import {
  Area,
  Bar,
  BarChart,
  CartesianGrid,
  Cell,
  ComposedChart,
  LabelList,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Scatter,
  XAxis,
  YAxis,
} from "recharts";
import { formatNumber, formatQuantity, formatRatio } from "@/lib/format";
import type { AxleLoadsResult, CheckStatus, EnvelopeResult, Link, TongueShareResult, UnitString, WeakestLinkResult } from "@/lib/towing";

const TONE: Record<CheckStatus, string> = {
  within: "var(--color-within)",
  tight: "var(--color-tight)",
  adjust: "var(--color-adjust)",
  over: "var(--color-over)",
  incomplete: "var(--color-unknown)",
};
const INK = "var(--color-ink)";
const SOFT = "var(--color-ink-soft)";
const RULE = "var(--color-rule)";
const TICK = { fill: SOFT, fontSize: 11 };

/**
 * True once the element has a width. A ResponsiveContainer in a parent with no size (the phone's verdict sheet
 * while it is closed is display: none) measures 0 × 0 and warns on every redraw, that is on every keystroke: the
 * chart is drawn only while its frame has a width, and drawn as soon as the sheet opens.
 */
function useHasWidth() {
  const ref = useRef<HTMLDivElement>(null);
  // Without ResizeObserver there is nothing to wait for: draw. With it, its first report (made for any frame with a
  // size) draws the chart; a frame with no size is not reported until it gets one.
  const [hasWidth, setHasWidth] = useState(() => typeof ResizeObserver === "undefined");
  useLayoutEffect(() => {
    const element = ref.current;
    if (!element || typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver((entries) => setHasWidth((entries[0]?.contentRect.width ?? 0) > 0));
    observer.observe(element);
    return () => observer.disconnect();
  }, []);
  return [ref, hasWidth] as const;
}

function ChartFrame({ title, summary, height, children }: { title: string; summary: string; height: number; children: ReactNode }) {
  const [ref, hasWidth] = useHasWidth();
  return (
    <figure className="min-w-0">
      <figcaption className="mb-1 text-[0.8125rem] font-semibold text-ink">{title}</figcaption>
      <div ref={ref} role="img" aria-label={summary} style={{ height }} className="w-full min-w-0" data-drawn={hasWidth || undefined}>
        {hasWidth ? children : null}
      </div>
    </figure>
  );
}

const tickOf = (unit: UnitString) => (v: number) => formatNumber(v, unit);

/**
 * Charts redraw only when what they draw changes: a new result object arrives on every keystroke, but most
 * keystrokes leave most charts' figures alone, and a recharts redraw costs more than the whole evaluation.
 */
function sameDrawing<P>(key: (props: P) => unknown) {
  return (a: P, b: P) => JSON.stringify(key(a)) === JSON.stringify(key(b));
}

function RatingGroup({ title, links, governingId, unit }: { title: string; links: Link[]; governingId?: string; unit: UnitString }) {
  const load = links.find((l) => l.actual)?.actual;
  const data = links.map((l) => ({
    name: l.id === governingId ? `${l.label} (governs)` : l.label,
    rating: l.rating.value,
    status: l.status,
    governs: l.id === governingId,
  }));
  const top = Math.max(load?.value ?? 0, ...data.map((d) => d.rating)) * 1.12;
  const summary =
    `${title}: ` +
    links.map((l) => `${l.label} ${formatQuantity(l.rating)}${l.id === governingId ? " (governs)" : ""}`).join("; ") +
    (load ? `. On it: ${formatQuantity(load)}.` : ". No load entered yet.");
  return (
    <ChartFrame title={title} summary={summary} height={36 + data.length * 30}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} layout="vertical" margin={{ top: 14, right: 44, bottom: 4, left: 4 }} barCategoryGap={6}>
          <CartesianGrid horizontal={false} stroke={RULE} />
          <XAxis type="number" domain={[0, top || 1]} tick={TICK} tickFormatter={tickOf(unit)} stroke={RULE} />
          <YAxis type="category" dataKey="name" width={150} tick={TICK} stroke={RULE} interval={0} />
          <Bar dataKey="rating" isAnimationActive={false}>
            {data.map((d) => (
              <Cell key={d.name} fill={d.governs ? "var(--color-accent-strong)" : "var(--color-accent-soft)"} stroke={d.governs ? INK : SOFT} />
            ))}
            <LabelList dataKey="rating" position="right" formatter={(v: unknown) => formatNumber(Number(v), unit)} fill={INK} fontSize={11} />
          </Bar>
          {load ? (
            <ReferenceLine x={load.value} stroke={TONE[links.find((l) => l.id === governingId)?.status ?? "within"]} strokeWidth={2.5} label={{ value: `On it ${formatQuantity(load)}`, position: "top", fill: INK, fontSize: 11 }} />
          ) : null}
        </BarChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}

/** Every rating of the weakest-link check against the load, gross trailer weight and tongue weight apart. */
export const RatingsChart = memo(function RatingsChart({ check }: { check: WeakestLinkResult }) {
  const gtw = check.links.filter((l) => l.limits === "gross-trailer-weight");
  const tw = check.links.filter((l) => l.limits === "tongue-weight");
  const unit = check.links[0]?.rating.unit ?? "";
  if (!gtw.length && !tw.length) return null;
  return (
    <div className="space-y-3">
      {gtw.length ? <RatingGroup title="Gross trailer weight ratings" links={gtw} governingId={check.governingGrossTrailerWeight?.id} unit={unit} /> : null}
      {tw.length ? <RatingGroup title="Tongue weight ratings" links={tw} governingId={check.governingTongueWeight?.id} unit={unit} /> : null}
    </div>
  );
}, sameDrawing(({ check }: { check: WeakestLinkResult }) => [check.links, check.governingGrossTrailerWeight?.id, check.governingTongueWeight?.id]));

/** The tongue's share of the trailer against the band it should sit in. */
export const TongueShareChart = memo(function TongueShareChart({ check }: { check: TongueShareResult }) {
  if (check.share === undefined) return null;
  const share = check.share * 100;
  const min = check.band.min * 100;
  const max = check.band.max * 100;
  const top = Math.max(20, share * 1.2, max * 1.25);
  const summary = `Tongue weight share ${formatRatio(check.share)}; the band is ${formatRatio(check.band.min)} to ${formatRatio(check.band.max)}.`;
  return (
    <ChartFrame title="Tongue-weight share and its band" summary={summary} height={96}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={[{ name: "Share", share }]} layout="vertical" margin={{ top: 18, right: 40, bottom: 4, left: 4 }}>
          <XAxis type="number" domain={[0, top]} tick={TICK} tickFormatter={(v: number) => `${formatNumber(v, "%", 0)} %`} stroke={RULE} />
          <YAxis type="category" dataKey="name" hide />
          <ReferenceArea x1={min} x2={max} fill="var(--color-within-soft)" stroke="var(--color-within)" strokeDasharray="3 3" label={{ value: "band", position: "insideTop", fill: SOFT, fontSize: 11 }} />
          <Bar dataKey="share" fill={TONE[check.status]} barSize={16} isAnimationActive={false}>
            <LabelList dataKey="share" position="right" formatter={(v: unknown) => `${formatNumber(Number(v), "%")} %`} fill={INK} fontSize={11} />
          </Bar>
          <ReferenceLine x={min} stroke={INK} label={{ value: `${formatNumber(min, "%")} %`, position: "top", fill: INK, fontSize: 11 }} />
          <ReferenceLine x={max} stroke={INK} label={{ value: `${formatNumber(max, "%")} %`, position: "top", fill: INK, fontSize: 11 }} />
        </BarChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}, sameDrawing(({ check }: { check: TongueShareResult }) => [check.share, check.band, check.status]));

/** Each axle unhitched, hitched and with weight distribution, against its GAWR. */
export const AxleChart = memo(function AxleChart({ check, gawrFront, gawrRear }: { check: AxleLoadsResult; gawrFront?: number; gawrRear?: number }) {
  const stages: Array<[string, AxleLoadsResult["unhitched"]]> = [
    ["Unhitched", check.unhitched],
    ["Hitched", check.hitched],
    ["With WD", check.withWd],
  ];
  const present = stages.filter((s): s is [string, NonNullable<AxleLoadsResult["unhitched"]>] => !!s[1]);
  if (!present.length) return null;
  const unit = present[0]![1].front.unit;
  const axles: Array<["front" | "rear", string, number | undefined]> = [
    ["front", "Front axle", gawrFront],
    ["rear", "Rear axle", gawrRear],
  ];
  return (
    <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-1 xl:grid-cols-2">
      {axles.map(([axle, title, gawr]) => {
        const data = present.map(([name, loads]) => ({ name, load: loads[axle].value, over: gawr !== undefined && loads[axle].value > gawr }));
        const top = Math.max(gawr ?? 0, ...data.map((d) => d.load)) * 1.15;
        const summary = `${title}: ${data.map((d) => `${d.name.toLowerCase()} ${formatQuantity({ value: d.load, unit })}`).join(", ")}` + (gawr !== undefined ? `; GAWR ${formatQuantity({ value: gawr, unit })}.` : "; GAWR not given.");
        return (
          <ChartFrame key={axle} title={`${title} against its GAWR`} summary={summary} height={40 + data.length * 28}>
            <ResponsiveContainer width="100%" height="100%">
              <BarChart data={data} layout="vertical" margin={{ top: 16, right: 44, bottom: 4, left: 4 }} barCategoryGap={6}>
                <CartesianGrid horizontal={false} stroke={RULE} />
                <XAxis type="number" domain={[0, top || 1]} tick={TICK} tickFormatter={tickOf(unit)} stroke={RULE} />
                <YAxis type="category" dataKey="name" width={72} tick={TICK} stroke={RULE} interval={0} />
                <Bar dataKey="load" isAnimationActive={false}>
                  {data.map((d) => (
                    <Cell key={d.name} fill={d.over ? TONE.over : "var(--color-accent)"} />
                  ))}
                  <LabelList dataKey="load" position="right" formatter={(v: unknown) => formatNumber(Number(v), unit)} fill={INK} fontSize={11} />
                </Bar>
                {gawr !== undefined ? (
                  <ReferenceLine x={gawr} stroke={INK} strokeWidth={2} label={{ value: `GAWR ${formatQuantity({ value: gawr, unit })}`, position: "top", fill: INK, fontSize: 11 }} />
                ) : null}
              </BarChart>
            </ResponsiveContainer>
          </ChartFrame>
        );
      })}
    </div>
  );
}, sameDrawing((p: { check: AxleLoadsResult; gawrFront?: number; gawrRear?: number }) => [p.check.unhitched, p.check.hitched, p.check.withWd, p.gawrFront, p.gawrRear]));

/**
 * The allowed region of gross trailer weight × tongue weight: under the lowest limits of each, between the
 * band's shares; this trailer as a point.
 */
export const EnvelopeChart = memo(function EnvelopeChart({ check, point }: { check: EnvelopeResult; point?: { grossTrailerWeight: number; tongueWeight: number } }) {
  if (check.region.length < 3 || !check.maxGrossTrailerWeight || !check.maxTongueWeight) return null;
  const unit = check.regionUnit;
  const gMax = check.maxGrossTrailerWeight.value;
  const tLimit = Math.min(...check.lines.filter((l) => l.kind === "tw-max" && l.value !== undefined).map((l) => l.value!));
  const lo = check.lines.find((l) => l.kind === "share-min")?.slope ?? 0.1;
  const hi = check.lines.find((l) => l.kind === "share-max")?.slope ?? 0.15;
  // The region's upper edge bends where the highest share meets the tongue limit; sample both edges there.
  const xs = Array.from(new Set([0, ...check.region.map((p) => p.grossTrailerWeight)])).sort((a, b) => a - b);
  const data = xs.map((g) => ({ g, range: [lo * g, Math.min(hi * g, Number.isFinite(tLimit) ? tLimit : hi * g)] as [number, number] }));
  const xTop = Math.max(gMax, point?.grossTrailerWeight ?? 0) * 1.15;
  const yTop = Math.max(check.maxTongueWeight.value, point?.tongueWeight ?? 0, hi * xTop) * 1.1;
  const inside = check.status === "within" || check.status === "tight";
  const summary =
    `Allowed region: up to ${formatQuantity(check.maxGrossTrailerWeight)} gross trailer weight and ${formatQuantity(check.maxTongueWeight)} tongue weight, with the tongue between ${formatRatio(lo)} and ${formatRatio(hi)} of the trailer.` +
    (point ? ` This trailer: ${formatQuantity({ value: point.grossTrailerWeight, unit })} with ${formatQuantity({ value: point.tongueWeight, unit })} on the tongue${inside ? ", inside" : ""}.` : "");
  return (
    <ChartFrame title="What this rig allows: trailer weight against tongue weight" summary={summary} height={230}>
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={data} margin={{ top: 18, right: 20, bottom: 18, left: 4 }}>
          <CartesianGrid stroke={RULE} />
          <XAxis
            type="number"
            dataKey="g"
            domain={[0, xTop || 1]}
            tick={TICK}
            tickFormatter={tickOf(unit)}
            stroke={RULE}
            label={{ value: `Gross trailer weight (${unit})`, position: "insideBottom", offset: -10, fill: SOFT, fontSize: 11 }}
          />
          <YAxis
            type="number"
            domain={[0, yTop || 1]}
            tick={TICK}
            tickFormatter={tickOf(unit)}
            stroke={RULE}
            width={48}
            label={{ value: `Tongue (${unit})`, angle: -90, position: "insideLeft", fill: SOFT, fontSize: 11, dy: 30 }}
          />
          <Area dataKey="range" type="linear" stroke="var(--color-within)" fill="var(--color-within-soft)" fillOpacity={0.9} isAnimationActive={false} />
          <ReferenceLine x={gMax} stroke={INK} strokeDasharray="4 3" label={{ value: `max ${formatNumber(gMax, unit)}`, position: "insideTopRight", fill: INK, fontSize: 11 }} />
          {Number.isFinite(tLimit) ? (
            <ReferenceLine y={tLimit} stroke={INK} strokeDasharray="4 3" label={{ value: `tongue max ${formatNumber(tLimit, unit)}`, position: "insideTopLeft", fill: INK, fontSize: 11 }} />
          ) : null}
          {point ? (
            <Scatter
              data={[{ g: point.grossTrailerWeight, t: point.tongueWeight }]}
              dataKey="t"
              fill={TONE[check.status]}
              stroke={INK}
              shape="diamond"
              isAnimationActive={false}
            >
              <LabelList dataKey="t" position="top" formatter={() => "this trailer"} fill={INK} fontSize={11} />
            </Scatter>
          ) : null}
        </ComposedChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}, sameDrawing((p: { check: EnvelopeResult; point?: { grossTrailerWeight: number; tongueWeight: number } }) => [p.check.region, p.check.lines, p.check.status, p.check.maxGrossTrailerWeight, p.check.maxTongueWeight, p.point]));
