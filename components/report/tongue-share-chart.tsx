/**
 * The tongue-weight share against its band, drawn on the server: the band as a shaded stretch between two
 * lines, this trailer's share as a marker, both labelled on the chart. The axis starts at zero.
 */
import { formatNumber, formatRatio } from "@/lib/format";
import type { CheckStatus } from "@/lib/towing/types";
import { verdictWords } from "@/components/ui/verdict-badge";
import { zeroScale } from "./chart-scale";

export interface TongueShareChartProps {
  title: string;
  /** Share of the trailer's weight on the tongue, 0.129 = 12.9 %. */
  share: number;
  band: { min: number; max: number };
  status: CheckStatus;
}

const WIDTH = 360;
const LEFT = 4;
const RIGHT = WIDTH - 4;

const STROKE: Record<CheckStatus, string> = {
  within: "stroke-within",
  tight: "stroke-tight",
  adjust: "stroke-adjust",
  over: "stroke-over",
  incomplete: "stroke-unknown",
};
const FILL: Record<CheckStatus, string> = {
  within: "fill-within",
  tight: "fill-tight",
  adjust: "fill-adjust",
  over: "fill-over",
  incomplete: "fill-unknown",
};

/** A band edge in whole percent unless it has a fraction (12.5 %). */
export function bandEdge(ratio: number): string {
  const percent = Math.round(ratio * 1000) / 10;
  return formatRatio(ratio, Number.isInteger(percent) ? 0 : 1);
}

export function TongueShareChart({ title, share, band, status }: TongueShareChartProps) {
  // Shares are drawn in percent so the axis reads in round figures.
  const scale = zeroScale(Math.max(band.max * 1.6, share * 1.15) * 100, 5);
  const sx = (ratio: number) => LEFT + ((Math.max(0, ratio) * 100) / scale.top) * (RIGHT - LEFT);
  const x = Math.min(RIGHT, sx(share));
  const x0 = sx(band.min);
  const x1 = sx(band.max);
  const bandTop = 30;
  const bandBottom = 54;
  const axisY = 64;
  const markerLabel = `This trailer: ${formatRatio(share)} · ${verdictWords[status]}`;
  const anchor = x < WIDTH * 0.3 ? "start" : x > WIDTH * 0.7 ? "end" : "middle";
  const labelX = anchor === "start" ? Math.max(LEFT, x - 4) : anchor === "end" ? Math.min(RIGHT, x + 4) : x;

  return (
    <svg
      role="img"
      aria-label={title}
      viewBox={`0 0 ${WIDTH} 100`}
      width={WIDTH}
      height={100}
      className="block h-auto w-full max-w-[28rem] overflow-visible font-sans tabular-nums"
    >
      <title>{title}</title>
      <text x={labelX} y={15} textAnchor={anchor} className="fill-ink text-[13px] font-semibold">
        {markerLabel}
      </text>

      <rect x={LEFT} y={bandTop + 8} width={RIGHT - LEFT} height={8} rx={2} className="fill-sunken" />
      <rect x={x0} y={bandTop} width={Math.max(1, x1 - x0)} height={bandBottom - bandTop} className="fill-within/15" />
      <line x1={x0} x2={x0} y1={bandTop - 2} y2={axisY} className="stroke-ink" strokeWidth={1.75} />
      <line x1={x1} x2={x1} y1={bandTop - 2} y2={axisY} className="stroke-ink" strokeWidth={1.75} />

      <line x1={x} x2={x} y1={19} y2={bandBottom + 4} className={STROKE[status]} strokeWidth={3} strokeLinecap="round" />
      <path d={`M ${x - 5} 19 L ${x + 5} 19 L ${x} 26 Z`} className={FILL[status]} />

      <line x1={LEFT} x2={RIGHT} y1={axisY} y2={axisY} className="stroke-ink-faint" strokeWidth={0.75} />
      <text x={LEFT} y={axisY + 15} className="fill-ink-soft text-[11.5px]">
        0 %
      </text>
      <text x={x0} y={axisY + 15} textAnchor="middle" className="fill-ink text-[12px] font-semibold">
        {bandEdge(band.min)}
      </text>
      <text x={x1} y={axisY + 15} textAnchor="middle" className="fill-ink text-[12px] font-semibold">
        {bandEdge(band.max)}
      </text>
      <text x={RIGHT} y={axisY + 15} textAnchor="end" className="fill-ink-soft text-[11.5px]">
        {`${formatNumber(scale.top, "%", 0)} %`}
      </text>
      <text x={(x0 + x1) / 2} y={axisY + 31} textAnchor="middle" className="fill-ink-soft text-[11.5px]">
        lowest and highest share
      </text>
    </svg>
  );
}
