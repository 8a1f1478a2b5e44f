"use client";

/**
 * The rig's rear seen from the side, to scale, in plain SVG: ground, rear tyre, bumper, receiver at its
 * height, the ball mount with its rise or drop (or the accessory, folded outline included), and the trade's
 * dimension lines with values and units. Draws what is known and says what is missing.
 */
import { memo, useEffect, useId, useRef, useState } from "react";
import { formatQuantity } from "@/lib/format";
import { MM_PER_IN, type RigInput } from "@/lib/towing";
import { type HitchedKind } from "./rig-form";

/** Nominal sizes for parts the rig does not measure; drawn dashed and named as assumed. */
const NOMINAL_TYRE_RADIUS_IN = 15;
const NOMINAL_RECEIVER_IN = 18;
const NOMINAL_OVERHANG_IN = 42;
const NOMINAL_MOUNT_LENGTH_IN = 8;
const RECEIVER_SIDE_IN: Record<string, number> = { "1-1/4": 1.25, "2": 2, "2-1/2": 2.5, "3": 3 };

export interface SideViewProps {
  /** The rig as entered so far (groups may be partial). */
  rig: Partial<RigInput> & { units: RigInput["units"] };
  kind: HitchedKind;
  /** The accessory's angle from the rear tyre, from the accessory-fit check, in degrees. */
  accessoryAngle?: number;
  className?: string;
}

function useWidth(fallback: number) {
  const ref = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(fallback);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver((entries) => {
      const w = entries[0]?.contentRect.width;
      if (w && Math.abs(w - width) > 1) setWidth(w);
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, [width]);
  return { ref, width };
}

interface DimProps {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  label: string;
  marker: string;
  /** Which side of the line the text sits on. */
  side?: "above" | "below" | "left" | "right";
  tone?: "ink" | "over";
}

/** A dimension line with arrows at both ends and its value. */
function Dim({ x1, y1, x2, y2, label, marker, side = "above", tone = "ink" }: DimProps) {
  const horizontal = Math.abs(y2 - y1) < Math.abs(x2 - x1);
  const mx = (x1 + x2) / 2;
  const my = (y1 + y2) / 2;
  const color = tone === "over" ? "var(--color-over)" : "var(--color-ink)";
  const tx = horizontal ? mx : side === "left" ? mx - 5 : mx + 5;
  const ty = horizontal ? (side === "below" ? my + 13 : my - 5) : my + 4;
  const anchor = horizontal ? "middle" : side === "left" ? "end" : "start";
  return (
    <g>
      <line x1={x1} y1={y1} x2={x2} y2={y2} stroke={color} strokeWidth={1} markerStart={`url(#${marker})`} markerEnd={`url(#${marker})`} />
      <text x={tx} y={ty} textAnchor={anchor} fontSize={11} fill={color} className="num" paintOrder="stroke" stroke="var(--color-panel)" strokeWidth={3}>
        {label}
      </text>
    </g>
  );
}

function SideViewImpl({ rig, kind, accessoryAngle, className }: SideViewProps) {
  const { ref, width } = useWidth(560);
  const marker = `${useId().replace(/:/g, "")}-arrow`;
  const toIn = (v: number | undefined) => (v === undefined ? undefined : rig.units === "metric" ? v / MM_PER_IN : v);
  const len = (v: number | undefined) => (v === undefined ? "" : formatQuantity({ value: v, unit: rig.units === "metric" ? "mm" : "in" }));
  const missing: string[] = [];

  const v = rig.vehicle ?? {};
  const h = rig.hitch ?? {};
  const bm = rig.ballMount ?? {};
  const acc = rig.accessory;
  const trailer = rig.trailer;
  const ext = toIn(rig.extender?.length) ?? 0;

  const receiverKnown = h.receiverHeight !== undefined;
  const recv = toIn(h.receiverHeight) ?? NOMINAL_RECEIVER_IN;
  if (!receiverKnown) missing.push("receiver height");
  const side = RECEIVER_SIDE_IN[h.receiverSize ?? "2"] ?? 2;
  const mountLength = toIn(bm.length);
  // The one measured figure is the rear axle to the pin hole; an older rig may carry the ball's figure instead.
  const legacyBall = v.rearAxleToPin === undefined && kind === "trailer" ? toIn(v.rearAxleToHitch) : undefined;
  const pinIn = toIn(v.rearAxleToPin) ?? (kind === "trailer" ? undefined : toIn(v.rearAxleToHitch));
  const overhangKnown = pinIn !== undefined || legacyBall !== undefined;
  if (!overhangKnown) missing.push("rear axle to pin hole");
  const pin = pinIn ?? (legacyBall !== undefined ? legacyBall - ext - (mountLength ?? NOMINAL_MOUNT_LENGTH_IN) : NOMINAL_OVERHANG_IN - NOMINAL_MOUNT_LENGTH_IN);
  const overhang = kind === "trailer" ? (legacyBall ?? pin + ext + (mountLength ?? NOMINAL_MOUNT_LENGTH_IN)) : pin;
  const fasciaKnown = h.pinToFascia !== undefined;
  const fascia = pin - (toIn(h.pinToFascia) ?? 5);
  if (!fasciaKnown) missing.push("pin hole to fascia");
  const R = NOMINAL_TYRE_RADIUS_IN;

  // Trailer pieces
  const drop = toIn(bm.drop);
  const ballX = kind === "trailer" ? overhang : undefined;
  const platform = drop !== undefined ? recv - drop : undefined;
  const coupler = toIn(trailer?.couplerHeight);
  if (kind === "trailer") {
    if (drop === undefined) missing.push("ball mount rise/drop");
    if (mountLength === undefined) missing.push("ball mount length");
    if (coupler === undefined) missing.push("coupler height");
  }

  // Accessory pieces
  const accPin = pin + ext;
  const below = toIn(acc?.lowestPointBelowShankTop);
  const behind = toIn(acc?.lowestPointBehindPin);
  const rise = toIn(acc?.shankRise) ?? 0;
  const fold = toIn(acc?.foldClearance);
  const lowY = below !== undefined ? recv + rise - below : undefined;
  const lowX = behind !== undefined ? accPin + behind : undefined;
  if (kind === "accessory") {
    if (below === undefined) missing.push("lowest point below the shank top");
    if (behind === undefined) missing.push("lowest point behind the pin");
    if (fold === undefined) missing.push("fold clearance");
  }
  const departure = v.departureAngle;
  if (departure === undefined) missing.push("departure angle");

  // Scene extent in inches, then one scale for both axes.
  const minX = -R - 6;
  const maxX = Math.max(pin + 18, (ballX ?? 0) + 14, (lowX ?? 0) + 30, accPin + 30);
  const maxY = Math.max(recv + (kind === "accessory" ? 40 : 22), 2 * R + 8);
  const pad = { left: 8, right: 8, top: 14, bottom: 30 };
  const s = Math.max(1, (width - pad.left - pad.right) / (maxX - minX));
  const height = Math.round(pad.top + maxY * s + pad.bottom);
  const X = (x: number) => pad.left + (x - minX) * s;
  const Y = (y: number) => pad.top + (maxY - y) * s;
  const ground = Y(0);

  const summary =
    `Side view, to scale. Receiver ${receiverKnown ? len(h.receiverHeight) : "height not given"} from the ground` +
    (fasciaKnown ? `, pin hole ${len(h.pinToFascia)} behind the fascia` : "") +
    (kind === "trailer" && drop !== undefined ? `, ball mount ${drop >= 0 ? "drop" : "rise"} ${len(Math.abs(bm.drop!))}` : "") +
    (kind === "trailer" && coupler !== undefined ? `, coupler ${len(trailer?.couplerHeight)} high` : "") +
    (kind === "accessory" && lowY !== undefined ? `, accessory's lowest point ${len(rig.units === "metric" ? lowY * MM_PER_IN : lowY)} above the ground` : "") +
    (accessoryAngle !== undefined ? ` at ${formatQuantity({ value: accessoryAngle, unit: "°" })} from the tyre` : "") +
    (departure !== undefined ? `; departure angle ${formatQuantity({ value: departure, unit: "°" })}` : "") +
    ".";
  const out = (inches: number) => (rig.units === "metric" ? inches * MM_PER_IN : inches);
  const foldRoom = h.pinToFascia !== undefined ? (toIn(h.pinToFascia) ?? 0) + ext : undefined;
  const foldOver = fold !== undefined && foldRoom !== undefined && fold > foldRoom;

  return (
    <figure className={className}>
      <div ref={ref} className="w-full">
        <svg width="100%" height={height} viewBox={`0 0 ${Math.max(1, Math.round(width))} ${height}`} role="img" aria-label={summary} className="block">
          <defs>
            <marker id={marker} viewBox="0 0 10 10" refX="5" refY="5" markerWidth="7" markerHeight="7" orient="auto-start-reverse">
              <path d="M 0 1 L 9 5 L 0 9 z" fill="var(--color-ink)" />
            </marker>
          </defs>
          {/* ground */}
          <line x1={0} y1={ground} x2={width} y2={ground} stroke="var(--color-ink-soft)" strokeWidth={1.5} />
          {Array.from({ length: Math.ceil(width / 14) }, (_, i) => (
            <line key={i} x1={i * 14} y1={ground + 1} x2={i * 14 - 6} y2={ground + 7} stroke="var(--color-rule)" />
          ))}
          {/* body and bumper: shape indicative, positions to scale */}
          <path
            d={`M ${X(minX)} ${Y(2 * R + 6)} L ${X(fascia - 4)} ${Y(Math.max(recv + 12, 2 * R + 6))} L ${X(fascia)} ${Y(recv + 10)} L ${X(fascia)} ${Y(recv + 3)} L ${X(fascia - 10)} ${Y(recv + 1)}`}
            fill="none"
            stroke="var(--color-ink-soft)"
            strokeWidth={1.5}
            strokeDasharray={fasciaKnown ? undefined : "4 3"}
          />
          {/* rear tyre */}
          <circle cx={X(0)} cy={Y(R)} r={R * s} fill="var(--color-sunken)" stroke="var(--color-ink-soft)" strokeWidth={1.5} strokeDasharray={overhangKnown ? "5 3" : "2 3"} />
          <circle cx={X(0)} cy={Y(R)} r={2.5} fill="var(--color-ink)" />
          {/* receiver tube */}
          <rect x={X(fascia - 8)} y={Y(recv)} width={(pin + 2 - (fascia - 8)) * s} height={side * s} fill="var(--color-panel)" stroke="var(--color-ink)" strokeWidth={1.5} strokeDasharray={receiverKnown ? undefined : "4 3"} />
          <circle cx={X(pin)} cy={Y(recv - side / 2)} r={Math.max(2, 0.3 * s)} fill="var(--color-ink)" />

          {kind === "trailer" ? (
            <g>
              {/* shank, drop and platform */}
              <path
                d={`M ${X(pin - 3)} ${Y(recv - side * 0.2)} L ${X((ballX ?? pin) - 2)} ${Y(recv - side * 0.2)} L ${X((ballX ?? pin) - 2)} ${Y(platform ?? recv - side)} L ${X((ballX ?? pin) + 2)} ${Y(platform ?? recv - side)}`}
                fill="none"
                stroke="var(--color-accent-strong)"
                strokeWidth={Math.max(3, side * s * 0.6)}
                strokeLinejoin="round"
                strokeDasharray={drop === undefined || mountLength === undefined ? "6 4" : undefined}
              />
              <circle cx={X(ballX ?? pin)} cy={Y((platform ?? recv - side) + 1)} r={Math.max(3, 1 * s)} fill="var(--color-accent-strong)" />
              {coupler !== undefined ? (
                <g>
                  <line x1={X((ballX ?? pin) - 6)} y1={Y(coupler)} x2={X((ballX ?? pin) + 12)} y2={Y(coupler)} stroke="var(--color-ink)" strokeDasharray="3 3" />
                  <Dim x1={X((ballX ?? pin) + 10)} y1={ground} x2={X((ballX ?? pin) + 10)} y2={Y(coupler)} label={`coupler ${len(trailer?.couplerHeight)}`} marker={marker} side="left" />
                </g>
              ) : null}
              {drop !== undefined && Math.abs(drop) > 0.05 ? (
                <Dim x1={X((ballX ?? pin) + 4)} y1={Y(recv)} x2={X((ballX ?? pin) + 4)} y2={Y(platform!)} label={`${drop >= 0 ? "drop" : "rise"} ${len(Math.abs(bm.drop!))}`} marker={marker} side="right" />
              ) : null}
            </g>
          ) : (
            <g>
              {ext > 0 ? <rect x={X(pin)} y={Y(recv)} width={ext * s} height={side * s} fill="var(--color-sunken)" stroke="var(--color-ink)" /> : null}
              {/* the accessory in use, drawn from its shank to its lowest point */}
              <path
                d={`M ${X(pin - 3)} ${Y(recv - side / 2)} L ${X(accPin + 4)} ${Y(recv - side / 2 + rise)} L ${X(lowX ?? accPin + 26)} ${Y(lowY ?? recv - 2)} L ${X((lowX ?? accPin + 26) + 8)} ${Y((lowY ?? recv - 2) + 2)}`}
                fill="none"
                stroke="var(--color-accent-strong)"
                strokeWidth={Math.max(3, side * s * 0.6)}
                strokeLinejoin="round"
                strokeDasharray={lowY === undefined || lowX === undefined ? "6 4" : undefined}
              />
              {lowX !== undefined && lowY !== undefined ? (
                <g>
                  <circle cx={X(lowX)} cy={Y(lowY)} r={4} fill={lowY <= 0 ? "var(--color-over)" : "var(--color-ink)"} />
                  <text x={X(lowX) + 6} y={Y(lowY) + 14} fontSize={11} fill="var(--color-ink)" className="num">
                    lowest point {len(out(lowY))} up
                  </text>
                  {/* the line from the tyre's contact point to the lowest point */}
                  <line x1={X(0)} y1={ground} x2={X(lowX)} y2={Y(lowY)} stroke="var(--color-accent)" strokeWidth={1.25} />
                  {accessoryAngle !== undefined ? (
                    <text x={X(lowX * 0.45)} y={Y(lowY * 0.45) - 6} fontSize={11} fill="var(--color-accent-strong)" className="num" paintOrder="stroke" stroke="var(--color-panel)" strokeWidth={3}>
                      accessory {formatQuantity({ value: accessoryAngle, unit: "°" })}
                    </text>
                  ) : null}
                </g>
              ) : null}
              {/* folded outline: how far forward of the pin it reaches */}
              {fold !== undefined ? (
                <g>
                  <rect x={X(accPin - fold)} y={Y(recv + 30)} width={Math.max(4, 3 * s)} height={30 * s} fill="none" stroke={foldOver ? "var(--color-over)" : "var(--color-ink-soft)"} strokeDasharray="5 3" />
                  <text x={X(accPin - fold) + Math.max(4, 3 * s) + 4} y={Y(recv + 26)} fontSize={11} fill="var(--color-ink-soft)">
                    folded
                  </text>
                  <Dim x1={X(accPin - fold)} y1={Y(recv + 16)} x2={X(accPin)} y2={Y(recv + 16)} label={`fold ${len(acc?.foldClearance)}`} marker={marker} tone={foldOver ? "over" : "ink"} />
                </g>
              ) : null}
            </g>
          )}

          {/* dimension lines that hold in both cases */}
          {receiverKnown ? <Dim x1={X(fascia - 12)} y1={ground} x2={X(fascia - 12)} y2={Y(recv)} label={`receiver ${len(h.receiverHeight)}`} marker={marker} side="left" /> : null}
          {fasciaKnown ? <Dim x1={X(fascia)} y1={Y(recv + 6)} x2={X(pin)} y2={Y(recv + 6)} label={`pin to fascia ${len(h.pinToFascia)}`} marker={marker} /> : null}
          {overhangKnown ? (
            legacyBall !== undefined ? (
              <Dim x1={X(0)} y1={ground + 18} x2={X(overhang)} y2={ground + 18} label={`rear axle to ball ${len(v.rearAxleToHitch)}`} marker={marker} side="below" />
            ) : (
              <Dim x1={X(0)} y1={ground + 18} x2={X(pin)} y2={ground + 18} label={`rear axle to pin ${len(v.rearAxleToPin ?? v.rearAxleToHitch)}`} marker={marker} side="below" />
            )
          ) : null}
          {departure !== undefined ? (
            <g>
              <line
                x1={X(0)}
                y1={ground}
                x2={X(maxX)}
                y2={Y(Math.tan((departure * Math.PI) / 180) * maxX)}
                stroke="var(--color-ink)"
                strokeDasharray="6 4"
              />
              <text x={X(maxX) - 4} y={Y(Math.tan((departure * Math.PI) / 180) * maxX) + 14} textAnchor="end" fontSize={11} fill="var(--color-ink)" className="num" paintOrder="stroke" stroke="var(--color-panel)" strokeWidth={3}>
                departure {formatQuantity({ value: departure, unit: "°" })}
              </text>
            </g>
          ) : null}
        </svg>
      </div>
      <figcaption className="mt-1 text-[0.8125rem] leading-snug text-ink-soft">
        To scale from the figures entered; the tyre and body are outlines, not measured.
        {missing.length ? <> Not yet given, drawn dashed or left out: {missing.join(", ")}.</> : null}
      </figcaption>
    </figure>
  );
}

export const SideView = memo(SideViewImpl);
