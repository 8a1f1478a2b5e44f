"use client";

/**
 * The rig's rear seen from the side, to scale, in plain SVG: ground, rear tyre, body and bumper fascia, the
 * receiver at its height, the ball mount with its rise or drop and the ball, the trailer's coupler at its
 * height, or the accessory unfolded and folded, with the trade's dimension lines (arrows, values, units).
 * Parts the rig does not measure are drawn dashed and named as assumed. Geometry lives in side-view-geometry.
 */
import { memo, useEffect, useId, useRef, useState } from "react";
import { formatQuantity } from "@/lib/format";
import { MM_PER_IN, type RigInput } from "@/lib/towing";
import { type HitchedKind } from "./rig-form";
import {
  ASSUMED,
  BALL_DIAMETER_IN,
  bodyPath,
  buildScene,
  FONT_PX,
  frame,
  layoutDims,
  RECEIVER_SIDE_IN,
  tyreBox,
  type DimSpec,
  type PlacedDim,
  type SideInput,
} from "./side-view-geometry";

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

const INK = "var(--color-ink)";
const SOFT = "var(--color-ink-soft)";
const FAINT = "var(--color-ink-faint)";
const PART = "var(--color-accent-strong)";
const DASH = "5 3";

/** A dimension line in the trade's way: thin line, arrowheads at both ends, extension lines, value and unit. */
function Dim({ d, marker, overMarker }: { d: PlacedDim; marker: string; overMarker: string }) {
  const color = d.tone === "over" ? "var(--color-over)" : INK;
  const m = `url(#${d.tone === "over" ? overMarker : marker})`;
  return (
    <g data-dim={d.id}>
      {d.ext.map(([x1, y1, x2, y2], i) => (
        <line key={i} x1={x1} y1={y1} x2={x2} y2={y2} stroke={FAINT} strokeWidth={0.75} />
      ))}
      {d.leader ? <line x1={d.leader[0]} y1={d.leader[1]} x2={d.leader[2]} y2={d.leader[3]} stroke={color} strokeWidth={0.75} /> : null}
      <line x1={d.x1} y1={d.y1} x2={d.x2} y2={d.y2} stroke={color} strokeWidth={1} markerStart={m} markerEnd={m} strokeDasharray={d.assumed ? "3 2" : undefined} />
      <text
        x={d.tx}
        y={d.ty}
        textAnchor={d.anchor}
        dominantBaseline={d.rotated ? "auto" : undefined}
        transform={d.rotated ? `rotate(-90 ${d.tx} ${d.ty})` : undefined}
        fontSize={FONT_PX}
        fill={color}
        className="num"
        paintOrder="stroke"
        stroke="var(--color-panel)"
        strokeWidth={3}
        strokeLinejoin="round"
      >
        {d.lines.length > 1
          ? d.lines.map((line, i) => (
              <tspan key={i} x={d.tx} dy={i ? FONT_PX + 2 : 0}>
                {i < d.lines.length - 1 ? `${line} ` : line}
              </tspan>
            ))
          : d.label}
      </text>
    </g>
  );
}

/** A steel part as a thick bar; an assumed one as a faint bar with a dashed centre line. */
function Bar({ d, width, assumed }: { d: string; width: number; assumed: boolean }) {
  return (
    <g>
      <path d={d} fill="none" stroke={PART} strokeOpacity={assumed ? 0.3 : 1} strokeWidth={width} strokeLinejoin="round" strokeLinecap="butt" />
      {assumed ? <path d={d} fill="none" stroke={PART} strokeWidth={1} strokeDasharray="4 3" /> : null}
    </g>
  );
}

function SideViewImpl({ rig, kind, accessoryAngle, className }: SideViewProps) {
  const { ref, width: measured } = useWidth(560);
  const width = Math.max(280, Math.round(measured));
  const uid = useId().replace(/:/g, "");
  const marker = `${uid}-arrow`;
  const overMarker = `${uid}-arrow-over`;
  const titleId = `${uid}-title`;
  const descId = `${uid}-desc`;
  const metric = rig.units === "metric";
  const toIn = (v: number | undefined) => (v === undefined ? undefined : metric ? v / MM_PER_IN : v);
  /** A length in the rig's own unit, from inches. */
  const len = (inches: number) => formatQuantity({ value: metric ? Math.round(inches * MM_PER_IN) : Math.round(inches * 10) / 10, unit: metric ? "mm" : "in" });
  /** A length as entered. */
  const given = (v: number) => formatQuantity({ value: v, unit: metric ? "mm" : "in" });

  const v = rig.vehicle ?? {};
  const h = rig.hitch ?? {};
  const bm = rig.ballMount ?? {};
  const acc = rig.accessory;
  const trailer = rig.trailer;
  const ext = toIn(rig.extender?.length) ?? 0;
  const mountLength = toIn(bm.length);
  // The one measured figure is the rear axle centre to the receiver pin hole; the ball lies the extender and
  // the ball mount's length further back. An older rig may still carry the ball's figure (rearAxleToHitch).
  const legacyBall = v.rearAxleToPin === undefined && kind === "trailer" ? toIn(v.rearAxleToHitch) : undefined;
  const pinFromAxle =
    toIn(v.rearAxleToPin) ??
    (legacyBall !== undefined ? legacyBall - ext - (mountLength ?? ASSUMED.mountLength) : kind === "trailer" ? undefined : toIn(v.rearAxleToHitch));
  const reachValue = v.rearAxleToPin ?? v.rearAxleToHitch;
  const reachWords = legacyBall !== undefined ? "rear axle to ball" : "rear axle to pin hole";

  const input: SideInput = {
    kind,
    receiverHeight: toIn(h.receiverHeight),
    receiverSide: RECEIVER_SIDE_IN[h.receiverSize ?? "2"] ?? 2,
    pinFromAxle,
    pinToFascia: toIn(h.pinToFascia),
    extender: ext,
    mountLength,
    drop: toIn(bm.drop),
    couplerHeight: toIn(trailer?.couplerHeight),
    ballDiameter: BALL_DIAMETER_IN[trailer?.ballSize ?? trailer?.couplerBallSize ?? "2"] ?? 2,
    accessoryShape: acc?.type === "cargo-carrier" ? "carrier" : "rack",
    shankRise: toIn(acc?.shankRise),
    lowestBelowShankTop: toIn(acc?.lowestPointBelowShankTop),
    lowestBehindPin: toIn(acc?.lowestPointBehindPin),
    foldClearance: toIn(acc?.foldClearance),
    departureAngle: v.departureAngle,
  };
  const sc = buildScene(input);
  const folds = kind === "accessory" && (acc?.type === "platform-rack" || acc?.type === "hanging-rack" || acc?.foldClearance !== undefined);

  // Dimensions: horizontal ones in lanes under the ground, vertical ones beside the parts they measure.
  const dims: DimSpec[] = [];
  const add = (d: DimSpec) => dims.push(d);
  if (h.receiverHeight !== undefined)
    add({ id: "receiver-height", dir: "v", x: Math.max(sc.tyre.r + 3, sc.tubeBack - 2.5), y1: 0, y2: sc.recv, label: `receiver height ${given(h.receiverHeight)}` });
  let lane = 0;
  if (pinFromAxle !== undefined && reachValue !== undefined) {
    const toBall = legacyBall !== undefined;
    add({ id: "axle-to-hitch", dir: "h", x1: 0, x2: toBall ? sc.ball!.x : sc.pin, lane: lane++, label: `${reachWords} ${given(reachValue)}`, e1: sc.tyre.cy, e2: toBall ? sc.ball!.cy - sc.ball!.r : sc.recv - sc.side });
  }
  if (h.pinToFascia !== undefined) add({ id: "pin-to-fascia", dir: "h", x1: sc.fascia, x2: sc.pin, lane: lane++, label: `pin hole to fascia ${given(h.pinToFascia)}`, e1: sc.bumperBottom, e2: sc.recv - sc.side });
  if (kind === "trailer") {
    if (bm.length !== undefined) add({ id: "mount-length", dir: "h", x1: sc.mountPin, x2: sc.ball!.x, lane: lane++, label: `ball mount ${given(bm.length)}`, e1: sc.recv - sc.side, e2: sc.ball!.platform - 1 });
    if (bm.drop !== undefined && Math.abs(bm.drop) > 0)
      add({ id: "drop", dir: "v", x: sc.ball!.x - 3.2, y1: sc.recv, y2: sc.ball!.platform, label: `${bm.drop > 0 ? "drop" : "rise"} ${given(Math.abs(bm.drop))}` });
    if (trailer?.couplerHeight !== undefined)
      add({ id: "coupler-height", dir: "v", x: sc.ball!.x + 10, y1: 0, y2: sc.coupler!, label: `coupler ${given(trailer.couplerHeight)}` });
  } else {
    if (acc?.lowestPointBehindPin !== undefined)
      add({ id: "lowest-behind", dir: "h", x1: sc.mountPin, x2: sc.low!.x, lane: lane++, label: `lowest point ${given(acc.lowestPointBehindPin)} behind pin`, e1: sc.recv - sc.side, e2: sc.low!.y });
    if (folds && acc?.foldClearance !== undefined) {
      const over = sc.foldRoom !== undefined && toIn(acc.foldClearance)! > sc.foldRoom + 1e-9;
      add({ id: "fold", dir: "h", x1: sc.foldFront!, x2: sc.mountPin, lane: lane++, label: `fold clearance ${given(acc.foldClearance)}`, tone: over ? "over" : "ink", e1: sc.hinge.y, e2: sc.recv - sc.side });
    }
    if (h.receiverHeight !== undefined && acc?.lowestPointBelowShankTop !== undefined)
      add({ id: "ground-clearance", dir: "v", x: sc.low!.x, y1: 0, y2: Math.max(0, sc.low!.y), label: `ground clearance ${len(sc.low!.y)}`, tone: sc.low!.y <= 0 ? "over" : "ink" });
  }
  const lanes = Math.max(1, lane);
  const f = frame(sc.extent, width, lanes);
  const { X, Y, s, ground } = f;
  const box = (x1: number, y1: number, x2: number, y2: number) => ({ x: X(Math.min(x1, x2)), y: Y(Math.max(y1, y2)), w: Math.abs(x2 - x1) * s, h: Math.abs(y2 - y1) * s });
  const parts = [tyreBox(sc, f), box(sc.tubeBack, sc.recv + 0.3, sc.mountPin + 2.5, sc.recv - sc.side - 0.3)];
  if (sc.ball) parts.push(box(sc.mountPin, sc.recv, sc.ball.x + 2, Math.min(sc.recv, sc.ball.platform) - 1), box(sc.ball.x - 2, sc.ball.platform, sc.ball.x + 2, sc.ball.cy + sc.ball.r));
  if (sc.ball && sc.coupler !== undefined) parts.push(box(sc.ball.x - 2, sc.coupler, sc.extent.maxX, sc.coupler + 3.8 + 14 / s));
  if (sc.low) parts.push(box(sc.hinge.x, Math.max(sc.hinge.y, sc.low.y) + 1, sc.trayEnd, Math.min(sc.hinge.y, sc.low.y) - 1));
  const placed = layoutDims(dims, f, parts);

  const missing: string[] = [];
  if (sc.assumed.receiverHeight) missing.push("receiver height");
  if (pinFromAxle === undefined) missing.push("rear axle to pin hole");
  if (sc.assumed.pinToFascia) missing.push("pin hole to fascia");
  if (kind === "trailer") {
    if (sc.assumed.mountLength) missing.push("ball mount length");
    if (sc.assumed.drop) missing.push("ball mount rise or drop");
    if (trailer?.couplerHeight === undefined) missing.push("coupler height");
  } else {
    if (sc.assumed.low) missing.push("accessory's lowest point");
    if (folds && sc.assumed.fold) missing.push("fold clearance");
  }

  const r1 = (n: number) => Math.round(n * 10) / 10;
  const title = kind === "trailer" ? "Side view of the hitch and trailer coupler, to scale" : "Side view of the hitch and accessory, folded and unfolded, to scale";
  const description =
    [
      h.receiverHeight !== undefined ? `Receiver ${given(h.receiverHeight)} above the ground` : "Receiver height not given",
      h.pinToFascia !== undefined ? `pin hole ${given(h.pinToFascia)} behind the fascia` : null,
      pinFromAxle !== undefined && reachValue !== undefined ? `${reachWords} ${given(reachValue)}` : null,
      kind === "trailer" && bm.length !== undefined ? `ball mount ${given(bm.length)} long` : null,
      kind === "trailer" && bm.drop !== undefined ? (bm.drop === 0 ? "no rise or drop" : `${bm.drop > 0 ? "drop" : "rise"} ${given(Math.abs(bm.drop))}`) : null,
      kind === "trailer" && trailer?.couplerHeight !== undefined ? `coupler ${given(trailer.couplerHeight)} high` : null,
      kind === "accessory" && acc?.lowestPointBehindPin !== undefined ? `lowest point ${given(acc.lowestPointBehindPin)} behind the pin` : null,
      kind === "accessory" && h.receiverHeight !== undefined && acc?.lowestPointBelowShankTop !== undefined ? `ground clearance ${len(sc.low!.y)}` : null,
      accessoryAngle !== undefined ? `${formatQuantity({ value: accessoryAngle, unit: "°" })} from the tyre` : null,
      folds && acc?.foldClearance !== undefined ? `folded it needs ${given(acc.foldClearance)} ahead of the pin${sc.foldRoom !== undefined ? ` of ${len(sc.foldRoom)} room` : ""}` : null,
      v.departureAngle !== undefined ? `departure angle ${formatQuantity({ value: v.departureAngle, unit: "°" })}` : null,
    ]
      .filter(Boolean)
      .join(", ") + (missing.length ? `. Assumed, drawn dashed: ${missing.join(", ")}.` : ".");

  const tube = { x: X(sc.tubeBack), y: Y(sc.recv + 0.3), w: (sc.mouth - sc.tubeBack) * s, h: (sc.side + 0.6) * s };
  const shankW = Math.max(2.5, (sc.side - 0.3) * s);
  const shankY = Y(sc.recv - sc.side / 2);

  return (
    <figure className={className}>
      <div ref={ref} className="w-full">
        <svg width="100%" height={f.height} viewBox={`0 0 ${width} ${f.height}`} role="img" aria-labelledby={titleId} aria-describedby={descId} className="block" data-scale={r1(s)}>
          <title id={titleId}>{title}</title>
          <desc id={descId}>{description}</desc>
          <defs>
            {[
              [marker, INK],
              [overMarker, "var(--color-over)"],
            ].map(([id, color]) => (
              <marker key={id} id={id} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="8" markerHeight="8" markerUnits="userSpaceOnUse" orient="auto-start-reverse">
                <path d="M 0 1.5 L 10 5 L 0 8.5 z" fill={color} />
              </marker>
            ))}
            <pattern id={`${uid}-hatch`} width="8" height="8" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
              <line x1="0" y1="0" x2="0" y2="8" stroke="var(--color-rule)" strokeWidth="1.5" />
            </pattern>
          </defs>

          {/* ground */}
          <rect x={0} y={ground} width={width} height={5} fill={`url(#${uid}-hatch)`} />
          <line x1={0} y1={ground} x2={width} y2={ground} stroke={SOFT} strokeWidth={1.25} />

          {/* the vehicle's rear: an outline, not measured, but its fascia and heights are where the figures put them */}
          <path d={bodyPath(sc, f)} fill={INK} fillOpacity={0.05} stroke={FAINT} strokeWidth={1} strokeDasharray={DASH} strokeLinejoin="round" />
          <line
            x1={X(sc.fascia)}
            y1={Y(sc.bumperTop)}
            x2={X(sc.fascia)}
            y2={Y(sc.bumperBottom)}
            stroke={INK}
            strokeWidth={2}
            strokeDasharray={sc.assumed.pinToFascia ? DASH : undefined}
          />
          <rect x={X(sc.fascia - 2.6)} y={Y(sc.bumperTop + 10)} width={1.4 * s} height={6 * s} rx={1} fill="var(--color-over)" fillOpacity={0.35} />
          <text x={X(sc.fascia) - 5} y={(Y(sc.bumperTop) + Y(sc.bumperBottom)) / 2 + 4} textAnchor="end" fontSize={10} fill={SOFT}>
            fascia
          </text>

          {/* rear tyre (assumed size) and axle centre */}
          <circle cx={X(0)} cy={Y(sc.tyre.cy)} r={sc.tyre.r * s} fill="var(--color-panel)" stroke={FAINT} strokeWidth={1.25} strokeDasharray={DASH} />
          <circle cx={X(0)} cy={Y(sc.tyre.cy)} r={sc.tyre.r * 0.55 * s} fill="none" stroke="var(--color-rule)" strokeWidth={1} />
          <path d={`M ${X(0) - 5} ${Y(sc.tyre.cy)} h 10 M ${X(0)} ${Y(sc.tyre.cy) - 5} v 10`} stroke={INK} strokeWidth={1} />
          <text x={X(0)} y={Y(sc.tyre.cy) + sc.tyre.r * 0.3 * s + 10} textAnchor="middle" fontSize={10} fill={FAINT}>
            tyre assumed
          </text>

          {/* receiver tube at its height, pin hole */}
          <rect x={tube.x} y={tube.y} width={tube.w} height={tube.h} fill="var(--color-panel)" stroke={INK} strokeWidth={1.25} strokeDasharray={sc.assumed.receiverHeight ? DASH : undefined} />

          {kind === "trailer" && sc.ball ? (
            <g>
              {sc.mountPin > sc.pin ? (
                <rect x={X(sc.mouth)} y={tube.y} width={(sc.mountPin - sc.pin) * s} height={tube.h} fill="var(--color-sunken)" stroke={INK} strokeWidth={1} />
              ) : null}
              {/* ball mount: shank, rise or drop, platform */}
              <Bar d={`M ${X(sc.pin - 6)} ${shankY} H ${X(sc.ball.x - 2.2)} V ${Y(sc.ball.platform - 0.5)} H ${X(sc.ball.x + 1.6)}`} width={shankW} assumed={sc.assumed.mountLength || sc.assumed.drop} />
              <rect x={X(sc.ball.x - 0.55)} y={Y(sc.ball.platform + 0.7)} width={1.1 * s} height={0.7 * s} fill={PART} />
              <circle cx={X(sc.ball.x)} cy={Y(sc.ball.cy)} r={sc.ball.r * s} fill={PART} />
              {sc.coupler !== undefined ? (
                <g>
                  {/* coupler at its own height, the tongue running on to the trailer */}
                  <path
                    d={`M ${X(sc.ball.x - sc.ball.r - 0.8)} ${Y(sc.coupler)} V ${Y(sc.coupler + 2)} Q ${X(sc.ball.x - sc.ball.r - 0.8)} ${Y(sc.coupler + 3.6)} ${X(sc.ball.x)} ${Y(sc.coupler + 3.6)} L ${X(sc.ball.x + 9)} ${Y(sc.coupler + 3.2)} H ${X(sc.extent.maxX)} V ${Y(sc.coupler + 0.6)} H ${X(sc.ball.x + sc.ball.r + 0.8)} V ${Y(sc.coupler)} Z`}
                    fill={INK}
                    fillOpacity={0.07}
                    stroke={INK}
                    strokeWidth={1.25}
                    strokeLinejoin="round"
                  />
                  <path d={`M ${X(sc.ball.x - 0.5)} ${Y(sc.coupler + 3.6)} l ${5 * s} ${-1.6 * s}`} stroke={INK} strokeWidth={Math.max(1.5, 0.6 * s)} strokeLinecap="round" />
                  <text x={X(sc.extent.maxX) - 2} y={Y(sc.coupler + 3.2) - 4} textAnchor="end" fontSize={10} fill={SOFT}>
                    to the trailer
                  </text>
                </g>
              ) : null}
            </g>
          ) : sc.low ? (
            <g>
              {sc.mountPin > sc.pin ? (
                <rect x={X(sc.mouth)} y={tube.y} width={(sc.mountPin - sc.pin) * s} height={tube.h} fill="var(--color-sunken)" stroke={INK} strokeWidth={1} />
              ) : null}
              {/* unfolded: shank (with its rise), arm down to the tray, the tray out to its end */}
              <Bar d={`M ${X(sc.pin - 6)} ${shankY} H ${X(sc.mountPin + 3)} L ${X(sc.mountPin + 4)} ${Y(sc.hinge.y)} L ${X(sc.hinge.x)} ${Y(sc.hinge.y)}`} width={shankW} assumed={sc.assumed.low} />
              {sc.accessoryShape === "carrier" ? (
                <rect x={X(sc.hinge.x)} y={Y(sc.low.y + 14)} width={(sc.trayEnd - sc.hinge.x) * s} height={14 * s} fill="var(--color-accent-soft)" stroke={PART} strokeWidth={1.25} strokeDasharray={sc.assumed.low ? "6 3" : undefined} />
              ) : (
                <Bar
                  d={`M ${X(sc.hinge.x)} ${Y(sc.hinge.y)} L ${X(sc.low.x)} ${Y(sc.low.y)} L ${X(sc.trayEnd)} ${Y(sc.low.y + 0.8)}${acc?.type === "hanging-rack" ? ` M ${X(sc.hinge.x + 2)} ${Y(sc.hinge.y)} V ${Y(sc.hinge.y + 30)} l ${10 * s} ${-2 * s}` : ""}`}
                  width={Math.max(2.5, 1.4 * s)}
                  assumed={sc.assumed.low}
                />
              )}
              <circle cx={X(sc.low.x)} cy={Y(sc.low.y)} r={3.5} fill={sc.low.y <= 0 ? "var(--color-over)" : INK} stroke="var(--color-panel)" strokeWidth={1.5} />
              {accessoryAngle !== undefined ? (
                <g>
                  <line x1={X(0) + sc.tyre.r * s * 0.2} y1={ground} x2={X(sc.low.x)} y2={Y(sc.low.y)} stroke="var(--color-accent)" strokeWidth={1} strokeDasharray="2 3" />
                </g>
              ) : null}
              {/* folded: the tray stands up from its hinge and reaches forward by the fold clearance */}
              {folds ? (
                <g>
                  <rect
                    x={X(sc.foldFront!)}
                    y={Y(sc.hinge.y + (sc.trayEnd - sc.hinge.x))}
                    width={Math.max(3, 2 * s)}
                    height={(sc.trayEnd - sc.hinge.x) * s}
                    fill="none"
                    stroke={sc.foldRoom !== undefined && sc.mountPin - sc.foldFront! > sc.foldRoom + 1e-9 ? "var(--color-over)" : SOFT}
                    strokeWidth={1.25}
                    strokeDasharray="2 2"
                  />
                  <text x={X(sc.foldFront!) + Math.max(3, 2 * s) + 4} y={Y(sc.hinge.y + (sc.trayEnd - sc.hinge.x)) + 10} fontSize={10} fill={SOFT}>
                    folded
                  </text>
                </g>
              ) : null}
            </g>
          ) : null}
          <circle cx={X(sc.pin)} cy={shankY} r={Math.max(1.8, 0.35 * s)} fill="var(--color-panel)" stroke={INK} strokeWidth={1} />

          {v.departureAngle !== undefined ? (
            <g>
              <line
                x1={X(0)}
                y1={ground}
                x2={X(sc.extent.maxX)}
                y2={Y(Math.tan((v.departureAngle * Math.PI) / 180) * sc.extent.maxX)}
                stroke={FAINT}
                strokeWidth={1}
                strokeDasharray="8 3 2 3"
              />
            </g>
          ) : null}

          {placed.map((d) => (
            <Dim key={d.id} d={d} marker={marker} overMarker={overMarker} />
          ))}
        </svg>
      </div>
      <figcaption className="mt-1 text-[0.8125rem] leading-snug text-ink-soft">
        To scale from the figures entered{v.departureAngle !== undefined ? `; the dot-dash line is the ${formatQuantity({ value: v.departureAngle, unit: "°" })} departure angle` : ""}
        {accessoryAngle !== undefined ? `, the dotted one the accessory's ${formatQuantity({ value: accessoryAngle, unit: "°" })}` : ""}. Tyre and body are outlines, not measured.
        {missing.length ? <> Assumed, drawn dashed: {missing.join(", ")}.</> : null}
      </figcaption>
    </figure>
  );
}

export const SideView = memo(SideViewImpl);
