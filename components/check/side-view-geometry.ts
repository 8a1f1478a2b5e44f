/**
 * Pure geometry of the check screen's side view: where the rear tyre, body, fascia, receiver, ball mount,
 * coupler or accessory sit, in inches from the rear axle centre (x, rearward positive) and the ground (y, up),
 * then one scale for both axes and a label layout in pixels that keeps every value clear of the tyre, of the
 * drawing's edges and of every other label. No React here: the component only paints what this returns.
 */

/** Parts the rig does not measure take these sizes; they are drawn dashed and named as assumed. */
export const ASSUMED = {
  tyreRadius: 15, // in; a common light-truck and SUV tyre, 30 in across
  receiverHeight: 18,
  pinFromAxle: 40,
  pinToFascia: 5,
  mountLength: 8,
  drop: 2,
  lowestBelowShankTop: 6,
  lowestBehindPin: 18,
  foldClearance: 8,
} as const;

/** Receiver opening (inside, square) per nominal size, in inches. */
export const RECEIVER_SIDE_IN: Record<string, number> = { "1-1/4": 1.25, "2": 2, "2-1/2": 2.5, "3": 3 };
/** Ball diameter per nominal size, in inches. */
export const BALL_DIAMETER_IN: Record<string, number> = { "1-7/8": 1.875, "2": 2, "2-5/16": 2.3125, "3": 3 };

export type SideKind = "trailer" | "accessory";
export type AccessoryShape = "rack" | "carrier";

/** Figures in inches; undefined means not given (the drawing assumes a size and says so). */
export interface SideInput {
  kind: SideKind;
  receiverHeight?: number;
  receiverSide: number;
  /** Rear axle centre to the receiver pin hole. */
  pinFromAxle?: number;
  pinToFascia?: number;
  extender: number;
  mountLength?: number;
  /** Positive is a drop, negative a rise. */
  drop?: number;
  couplerHeight?: number;
  ballDiameter: number;
  accessoryShape?: AccessoryShape;
  shankRise?: number;
  lowestBelowShankTop?: number;
  lowestBehindPin?: number;
  foldClearance?: number;
  departureAngle?: number;
}

export interface Pt {
  x: number;
  y: number;
}

/** The scene in inches. */
export interface SideScene {
  kind: SideKind;
  tyre: { cx: number; cy: number; r: number };
  recv: number;
  side: number;
  pin: number;
  /** The accessory's or ball mount's own pin hole: the receiver's, plus any extender. */
  mountPin: number;
  fascia: number;
  mouth: number;
  tubeBack: number;
  bumperTop: number;
  bumperBottom: number;
  bodyTop: number;
  ball?: { x: number; platform: number; cy: number; r: number };
  coupler?: number;
  low?: Pt;
  accessoryShape: AccessoryShape;
  trayEnd: number;
  hinge: Pt;
  foldFront?: number;
  foldRoom?: number;
  assumed: {
    receiverHeight: boolean;
    pinFromAxle: boolean;
    pinToFascia: boolean;
    mountLength: boolean;
    drop: boolean;
    low: boolean;
    fold: boolean;
  };
  extent: { minX: number; maxX: number; maxY: number };
}

export function buildScene(i: SideInput): SideScene {
  const R = ASSUMED.tyreRadius;
  const recv = i.receiverHeight ?? ASSUMED.receiverHeight;
  const side = i.receiverSide;
  const pin = i.pinFromAxle ?? ASSUMED.pinFromAxle;
  const fascia = pin - (i.pinToFascia ?? ASSUMED.pinToFascia);
  const mountPin = pin + i.extender;
  const mouth = pin + 2.5;
  const tubeBack = pin - 9;
  const bumperBottom = recv + 2;
  const bumperTop = recv + 11;
  const bodyTop = Math.max(bumperTop + 16, 2 * R + 14);
  const shape = i.accessoryShape ?? "rack";
  let ball: SideScene["ball"];
  let coupler: number | undefined;
  let low: Pt | undefined;
  let trayEnd = mountPin + 30;
  let hinge: Pt = { x: mountPin + 6, y: recv };
  let foldFront: number | undefined;
  let maxX: number;
  let maxY = bodyTop + 4;
  if (i.kind === "trailer") {
    const length = i.mountLength ?? ASSUMED.mountLength;
    const drop = i.drop ?? ASSUMED.drop;
    const x = mountPin + length;
    const platform = recv - drop;
    const r = i.ballDiameter / 2;
    ball = { x, platform, cy: platform + 0.6 + r, r };
    coupler = i.couplerHeight;
    maxX = x + 22;
    maxY = Math.max(maxY, (coupler ?? platform) + 8);
  } else {
    const rise = i.shankRise ?? 0;
    const lowY = recv + rise - (i.lowestBelowShankTop ?? ASSUMED.lowestBelowShankTop);
    const lowX = mountPin + (i.lowestBehindPin ?? ASSUMED.lowestBehindPin);
    low = { x: lowX, y: lowY };
    hinge = { x: mountPin + 6, y: recv - side / 2 + rise };
    trayEnd = Math.max(lowX + 6, mountPin + 30);
    foldFront = mountPin - (i.foldClearance ?? ASSUMED.foldClearance);
    // Folded, the tray stands up from its hinge as tall as it is long.
    maxY = Math.max(maxY, hinge.y + (trayEnd - hinge.x) + 2);
    maxX = trayEnd + 8;
  }
  return {
    kind: i.kind,
    tyre: { cx: 0, cy: R, r: R },
    recv,
    side,
    pin,
    mountPin,
    fascia,
    mouth,
    tubeBack,
    bumperTop,
    bumperBottom,
    bodyTop,
    ball,
    coupler,
    low,
    accessoryShape: shape,
    trayEnd,
    hinge,
    foldFront,
    foldRoom: i.pinToFascia !== undefined ? i.pinToFascia + i.extender : undefined,
    assumed: {
      receiverHeight: i.receiverHeight === undefined,
      pinFromAxle: i.pinFromAxle === undefined,
      pinToFascia: i.pinToFascia === undefined,
      mountLength: i.mountLength === undefined,
      drop: i.drop === undefined,
      low: i.lowestBelowShankTop === undefined || i.lowestBehindPin === undefined,
      fold: i.foldClearance === undefined,
    },
    extent: { minX: -R - 3, maxX, maxY },
  };
}

/** Space kept around the scene, in pixels: the bottom holds the stacked horizontal dimension lanes. */
export const PAD = { left: 6, right: 6, top: 10, lane: 22, lanesTop: 14, bottomExtra: 8 } as const;
/** Never more than this many pixels per inch, so a wide screen does not draw a poster. */
export const MAX_SCALE = 7;

export interface Frame {
  /** Pixels per inch, both axes. */
  s: number;
  width: number;
  height: number;
  /** Pixel y of the ground line. */
  ground: number;
  X: (x: number) => number;
  Y: (y: number) => number;
}

/** One scale for both axes, fitted to the width; the height follows from the scene and the lanes below it. */
export function frame(extent: SideScene["extent"], width: number, lanes: number): Frame {
  const span = extent.maxX - extent.minX;
  const s = Math.min(MAX_SCALE, Math.max(0.5, (width - PAD.left - PAD.right) / span));
  const drawn = span * s;
  const left = PAD.left + Math.max(0, (width - PAD.left - PAD.right - drawn) / 2);
  const ground = PAD.top + extent.maxY * s;
  const height = Math.round(ground + PAD.lanesTop + lanes * PAD.lane + PAD.bottomExtra);
  return { s, width, height, ground, X: (x) => left + (x - extent.minX) * s, Y: (y) => ground - y * s };
}

/** A dimension in scene inches: horizontal ones go in numbered lanes under the ground, vertical ones stand at x. */
export type DimSpec =
  | {
      id: string;
      dir: "h";
      x1: number;
      x2: number;
      lane: number;
      label: string;
      tone?: "ink" | "over";
      assumed?: boolean;
      /** Heights (in) of the features the two extension lines start from; the ground when not given. */
      e1?: number;
      e2?: number;
    }
  | { id: string; dir: "v"; x: number; y1: number; y2: number; label: string; tone?: "ink" | "over"; assumed?: boolean };

export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

export interface PlacedDim {
  id: string;
  dir: "h" | "v";
  /** The dimension line, in pixels. */
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  label: string;
  tone: "ink" | "over";
  assumed: boolean;
  /** Text anchor point (SVG text x, y; rotate -90 about it when rotated). */
  tx: number;
  ty: number;
  rotated: boolean;
  anchor: "start" | "middle" | "end";
  /** One line, or the name over the value where one line has no room. */
  lines: string[];
  /** A thin line from a label set away from its dimension back to it. */
  leader?: [number, number, number, number];
  /** The label's box on the page, whatever its rotation. */
  box: Box;
  /** Extension lines from the measured feature to the dimension line. */
  ext: Array<[number, number, number, number]>;
}

export const FONT_PX = 11;
/** Width of a label at the drawing's font size: tabular figures and the interface sans run under 0.52 em. */
export function textWidth(label: string): number {
  return Math.ceil(label.length * FONT_PX * 0.52) + 2;
}

/** "receiver height 20.0 in" → ["receiver height", "20.0 in"]: the name over its value and unit. */
export function splitLabel(label: string): string[] {
  const m = /^(.*\S)\s+(\S+ (?:in|mm|°))$/.exec(label);
  return m ? [m[1]!, m[2]!] : [label];
}

export function overlaps(a: Box, b: Box): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

/**
 * Places every dimension's label at the first of its candidate spots that stays inside the drawing and clear
 * of the obstacles (the tyre) and of the labels already placed. Horizontal dimensions sit in lanes under the
 * ground, with their text over the line or beside an end; vertical ones read up the line when the span is long
 * enough, otherwise beside it.
 */
export function layoutDims(dims: DimSpec[], f: Frame, obstacles: Box[]): PlacedDim[] {
  const taken: Box[] = [...obstacles];
  const inside = (b: Box) => b.x >= 1 && b.x + b.w <= f.width - 1 && b.y >= 1 && b.y + b.h <= f.height - 1;
  const clear = (b: Box) => inside(b) && !taken.some((t) => overlaps(b, t));
  const H = FONT_PX + 2;
  // Vertical dimension lines are obstacles for every label but their own.
  const lines = dims.map((d) =>
    d.dir === "v" ? { x: f.X(d.x) - 1.5, y: f.Y(Math.max(d.y1, d.y2)), w: 3, h: Math.abs(d.y2 - d.y1) * f.s } : undefined,
  );
  // The lanes belong to the horizontal dimensions: place them first, then the vertical ones above the ground.
  const order = dims.map((d, n) => n).sort((a, b) => (dims[a]!.dir === dims[b]!.dir ? a - b : dims[a]!.dir === "h" ? -1 : 1));
  const byId: PlacedDim[] = [];
  order.forEach((n) => {
    const d = dims[n]!;
    const others = lines.filter((b, k): b is Box => !!b && k !== n);
    const aboveGround = (b: Box) => d.dir === "h" || b.y + b.h <= f.ground - 1;
    const clearOf = (b: Box) => clear(b) && aboveGround(b) && !others.some((t) => overlaps(b, t));
    const w = textWidth(d.label);
    const tone = d.tone ?? "ink";
    const assumed = d.assumed ?? false;
    if (d.dir === "h") {
      const y = f.ground + PAD.lanesTop + d.lane * PAD.lane + 6;
      const x1 = f.X(Math.min(d.x1, d.x2));
      const x2 = f.X(Math.max(d.x1, d.x2));
      const mid = (x1 + x2) / 2;
      const candidates: Array<{ tx: number; anchor: PlacedDim["anchor"]; box: Box }> = [];
      if (x2 - x1 > w + 14) candidates.push({ tx: mid, anchor: "middle", box: { x: mid - w / 2, y: y - H - 1, w, h: H } });
      candidates.push({ tx: x2 + 6, anchor: "start", box: { x: x2 + 6, y: y - H / 2 - 1, w, h: H } });
      candidates.push({ tx: x1 - 6, anchor: "end", box: { x: x1 - 6 - w, y: y - H / 2 - 1, w, h: H } });
      const cm = Math.min(Math.max(mid, w / 2 + 2), f.width - w / 2 - 2);
      candidates.push({ tx: cm, anchor: "middle", box: { x: cm - w / 2, y: y - H - 1, w, h: H } });
      const pick = candidates.find((c) => clearOf(c.box)) ?? candidates.find((c) => clear(c.box)) ?? candidates[0]!;
      const ty = pick.anchor === "middle" ? y - 4 : y + 4;
      taken.push(pick.box);
      const ext: PlacedDim["ext"] = [];
      // From just clear of the feature to just past the dimension line.
      ext.push([f.X(d.x1), f.Y(d.e1 ?? 0) + 2, f.X(d.x1), y + 4]);
      ext.push([f.X(d.x2), f.Y(d.e2 ?? 0) + 2, f.X(d.x2), y + 4]);
      byId[n] = ({ id: d.id, dir: "h", x1: f.X(d.x1), y1: y, x2: f.X(d.x2), y2: y, label: d.label, lines: [d.label], tone, assumed, tx: pick.tx, ty, rotated: false, anchor: pick.anchor, box: pick.box, ext });
    } else {
      const x = f.X(d.x);
      const yTop = f.Y(Math.max(d.y1, d.y2));
      const yBot = f.Y(Math.min(d.y1, d.y2));
      const mid = (yTop + yBot) / 2;
      type C = { tx: number; ty: number; rotated: boolean; anchor: PlacedDim["anchor"]; box: Box; lines: string[]; away: boolean };
      const candidates: C[] = [];
      const one = [d.label];
      const two = splitLabel(d.label);
      const w2 = Math.max(...two.map(textWidth));
      if (yBot - yTop > w + 12) {
        candidates.push({ tx: x - 4, ty: mid, rotated: true, anchor: "middle", box: { x: x - 4 - H + 2, y: mid - w / 2, w: H, h: w }, lines: one, away: false });
        candidates.push({ tx: x + H + 1, ty: mid, rotated: true, anchor: "middle", box: { x: x + 3, y: mid - w / 2, w: H, h: w }, lines: one, away: false });
      }
      const beside = (ty: number, lines: string[], away: boolean) => {
        const lw = lines.length > 1 ? w2 : w;
        const lh = lines.length * H;
        const top = ty - lh / 2;
        candidates.push({ tx: x + 6, ty: top + FONT_PX - 1, rotated: false, anchor: "start", box: { x: x + 6, y: top, w: lw, h: lh }, lines, away });
        candidates.push({ tx: x - 6, ty: top + FONT_PX - 1, rotated: false, anchor: "end", box: { x: x - 6 - lw, y: top, w: lw, h: lh }, lines, away });
      };
      beside(mid, one, false);
      if (two.length > 1) beside(mid, two, false);
      for (const k of [-1, 1, -2, 2, -3, 3, -4, 4, -5, 5, -6, 6]) {
        beside(mid + k * (H + 2), one, true);
        if (two.length > 1) beside(mid + k * (H + 2), two, true);
      }
      candidates.push({ tx: x, ty: yTop - 6, rotated: false, anchor: "middle", box: { x: x - w / 2, y: yTop - 6 - H + 3, w, h: H }, lines: one, away: false });
      const pick = candidates.find((c) => clearOf(c.box)) ?? candidates.find((c) => clear(c.box) && aboveGround(c.box)) ?? candidates[0]!;
      taken.push(pick.box);
      let leader: PlacedDim["leader"];
      if (pick.away) {
        const bx = pick.anchor === "start" ? pick.box.x - 1 : pick.box.x + pick.box.w + 1;
        const by = pick.box.y + pick.box.h / 2;
        leader = [bx, by, x, Math.min(Math.max(by, yTop + 3), yBot - 3)];
      }
      byId[n] = ({ id: d.id, dir: "v", x1: x, y1: yBot, x2: x, y2: yTop, label: d.label, lines: pick.lines, leader, tone, assumed, tx: pick.tx, ty: pick.ty, rotated: pick.rotated, anchor: pick.anchor, box: pick.box, ext: [] });
    }
  });
  return byId;
}

/** The tyre's box in pixels, an obstacle for every label. */
export function tyreBox(scene: SideScene, f: Frame): Box {
  const { cx, cy, r } = scene.tyre;
  return { x: f.X(cx - r) - 2, y: f.Y(cy + r) - 2, w: 2 * r * f.s + 4, h: 2 * r * f.s + 4 };
}

/** The vehicle's rear as one closed outline: body side, rear face, bumper, underside and the wheel arch. */
export function bodyPath(scene: SideScene, f: Frame): string {
  const { tyre, fascia, bumperTop, bumperBottom, bodyTop, extent } = scene;
  const archR = tyre.r + 2.5;
  const underY = Math.max(bumperBottom, tyre.cy + 1);
  const archX = Math.sqrt(Math.max(0, archR * archR - (underY - tyre.cy) ** 2));
  const sill = Math.max(tyre.cy + 2, Math.min(underY, tyre.cy + archR - 1));
  const sillX = -Math.sqrt(Math.max(0, archR * archR - (sill - tyre.cy) ** 2));
  const X = f.X;
  const Y = f.Y;
  const r = (v: number) => Math.round(v * 10) / 10;
  const p = (x: number, y: number) => `${r(X(x))} ${r(Y(y))}`;
  const faceX = fascia - 1.2;
  const rearUnder = Math.max(faceX - 1, archX + 0.5);
  return [
    `M ${p(extent.minX, bodyTop)}`,
    `L ${p(faceX - 5, bodyTop)}`,
    `Q ${p(faceX, bodyTop)} ${p(faceX, bodyTop - 4)}`,
    `L ${p(faceX, bumperTop + 1)}`,
    `L ${p(fascia, bumperTop)}`,
    `L ${p(fascia, bumperBottom + 1.5)}`,
    `Q ${p(fascia, bumperBottom)} ${p(fascia - 1.5, bumperBottom)}`,
    `L ${p(rearUnder, bumperBottom)}`,
    `L ${p(archX, underY)}`,
    `A ${r(archR * f.s)} ${r(archR * f.s)} 0 0 0 ${p(sillX, sill)}`,
    `L ${p(extent.minX, sill)}`,
    "Z",
  ].join(" ");
}
