/**
 * Horizontal bar rows drawn on the server as one inline SVG: the load as a bar from zero, each limit as a
 * dark line across it, the governing limit thicker and named in words. Labels sit on the chart itself.
 */
import type { ReactNode } from "react";
import { formatNumber } from "@/lib/format";
import type { CheckStatus, Quantity } from "@/lib/towing/types";
import { verdictWords } from "@/components/ui/verdict-badge";
import { FILL, textWidth, wrapWords, zeroScale } from "./chart-scale";

export interface BarRow {
  id: string;
  label: string;
  /** The load drawn as a bar; absent when it was not entered. */
  load?: Quantity;
  limit: Quantity;
  status: CheckStatus;
  /** The limit that decides; drawn heavier and named. */
  governing?: boolean;
  /** The limit in words at the right end of the bar, e.g. "7,000 lb". */
  valueText: string;
}

export interface BarGroup {
  id: string;
  title: string;
  rows: BarRow[];
}

export interface BarRowsChartProps {
  /** Read by screen readers and shown as a tooltip. */
  title: string;
  groups: BarGroup[];
  /** Word used under the governing row. */
  governingNote?: string;
}

const WIDTH = 360;
const FONT = 13;
const LINE = 16;
const BAR = 10;
const VALUE_FONT = 12;

interface Layout {
  height: number;
  nodes: ReactNode[];
}

function layoutGroups(groups: BarGroup[], governingNote: string): Layout {
  const nodes: ReactNode[] = [];
  let y = 0;
  groups.forEach((group, gi) => {
    if (gi > 0) y += 14;
    const unit = group.rows[0]?.limit.unit ?? "";
    const max = Math.max(...group.rows.flatMap((row) => [row.limit.value, row.load?.value ?? 0]));
    const scale = zeroScale(max * 1.04);
    // Each row's limit is written at the right of its bar; the track leaves room for the longest.
    const valueWidth = Math.max(...group.rows.map((row) => textWidth(row.valueText, VALUE_FONT))) + 8;
    const trackEnd = WIDTH - valueWidth;
    const sx = (value: number) => (Math.max(0, value) / scale.top) * (trackEnd - 2) + 1;

    for (const [i, text] of wrapWords(group.title, Math.floor(WIDTH / (13.5 * 0.52))).entries()) {
      y += i === 0 ? 14 : 17;
      nodes.push(
        <text key={`${group.id}-title-${i}`} x={0} y={y} className="fill-ink text-[13.5px] font-semibold">
          {text}
        </text>,
      );
    }
    y += 4;

    for (const row of group.rows) {
      const status = verdictWords[row.status];
      const maxChars = Math.max(12, Math.floor((WIDTH - textWidth(status, FONT) - 10) / (FONT * 0.52)));
      const lines = wrapWords(row.label, maxChars);
      const last = lines[lines.length - 1] ?? "";
      // The governing note rides on the label's last line when it fits, else on a line of its own.
      const noteInline = row.governing && last.length + 3 + governingNote.length <= maxChars;
      const rowTop = y;
      lines.forEach((text, i) => {
        const isLast = i === lines.length - 1;
        nodes.push(
          <text
            key={`${group.id}-${row.id}-l${i}`}
            x={0}
            y={rowTop + LINE * (i + 1) - 3}
            className={row.governing ? "fill-ink text-[13px] font-semibold" : "fill-ink text-[13px]"}
          >
            {text}
            {isLast && noteInline ? <tspan className="text-[12px]">{` (${governingNote})`}</tspan> : null}
          </text>,
        );
      });
      nodes.push(
        <text key={`${group.id}-${row.id}-s`} x={WIDTH} y={rowTop + LINE - 3} textAnchor="end" className={`${FILL[row.status]} text-[13px] font-semibold`}>
          {status}
        </text>,
      );
      y += LINE * lines.length;
      if (row.governing && !noteInline) {
        nodes.push(
          <text key={`${group.id}-${row.id}-g`} x={0} y={y + LINE - 4} className="fill-ink text-[12px] font-semibold">
            {governingNote}
          </text>,
        );
        y += LINE;
      }
      const barTop = y + 2;
      nodes.push(
        <rect key={`${group.id}-${row.id}-t`} x={1} y={barTop} width={trackEnd - 2} height={BAR} rx={2} className="fill-sunken stroke-rule" strokeWidth={0.5} />,
      );
      if (row.load) {
        nodes.push(
          <rect
            key={`${group.id}-${row.id}-b`}
            x={1}
            y={barTop}
            width={Math.max(0, sx(row.load.value) - 1)}
            height={BAR}
            rx={2}
            className={FILL[row.status]}
          />,
        );
      }
      const lx = sx(row.limit.value);
      nodes.push(
        <line
          key={`${group.id}-${row.id}-m`}
          x1={lx}
          x2={lx}
          y1={barTop - 4}
          y2={barTop + BAR + 4}
          className="stroke-ink"
          strokeWidth={row.governing ? 3.5 : 1.75}
          strokeLinecap="round"
        />,
      );
      nodes.push(
        <text
          key={`${group.id}-${row.id}-v`}
          x={WIDTH}
          y={barTop + BAR - 1}
          textAnchor="end"
          className={row.governing ? "fill-ink text-[12px] font-semibold" : "fill-ink-soft text-[12px]"}
        >
          {row.valueText}
        </text>,
      );
      y = barTop + BAR + 7;
    }

    // Axis from zero, in the group's unit.
    const axisY = y;
    nodes.push(<line key={`${group.id}-axis`} x1={1} x2={trackEnd - 1} y1={axisY} y2={axisY} className="stroke-ink-faint" strokeWidth={0.75} />);
    scale.ticks.forEach((tick, i) => {
      const x = sx(tick);
      nodes.push(
        <g key={`${group.id}-tick-${tick}`}>
          <line x1={x} x2={x} y1={axisY} y2={axisY + 3} className="stroke-ink-faint" strokeWidth={0.75} />
          <text x={x} y={axisY + 15} textAnchor={i === 0 ? "start" : "middle"} className="fill-ink-soft text-[11.5px]">
            {formatNumber(tick, unit)}
          </text>
        </g>,
      );
    });
    // The unit once, at the end of the axis, clear of the last figure.
    nodes.push(
      <text key={`${group.id}-unit`} x={WIDTH} y={axisY + 15} textAnchor="end" className="fill-ink-soft text-[11.5px]">
        {unit}
      </text>,
    );
    y = axisY + 18;
  });
  return { height: y + 2, nodes };
}

export function BarRowsChart({ title, groups, governingNote = "lowest — this one decides" }: BarRowsChartProps) {
  const { height, nodes } = layoutGroups(groups, governingNote);
  return (
    <svg
      role="img"
      aria-label={title}
      viewBox={`0 0 ${WIDTH} ${height}`}
      width={WIDTH}
      height={height}
      className="block h-auto w-full max-w-[28rem] overflow-visible font-sans tabular-nums"
    >
      <title>{title}</title>
      {nodes}
    </svg>
  );
}
