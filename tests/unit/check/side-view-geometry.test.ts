import { describe, expect, it } from "vitest";
import { buildScene, frame, layoutDims, overlaps, splitLabel, tyreBox, type DimSpec, type SideInput } from "@/components/check/side-view-geometry";

const trailerInput: SideInput = {
  kind: "trailer",
  receiverHeight: 20,
  receiverSide: 2,
  pinFromAxle: 40,
  pinToFascia: 5,
  extender: 0,
  mountLength: 8,
  drop: 4,
  couplerHeight: 16.5,
  ballDiameter: 2,
};
const rackInput: SideInput = {
  kind: "accessory",
  receiverHeight: 20,
  receiverSide: 2,
  pinFromAxle: 40,
  pinToFascia: 5,
  extender: 6,
  ballDiameter: 2,
  shankRise: 2,
  lowestBelowShankTop: 8,
  lowestBehindPin: 20,
  foldClearance: 9,
};

describe("side view geometry", () => {
  it("one scale for both axes: a receiver 20 in high on a 512 px drawing of 100 in width stands 100 px above the ground", () => {
    // Statics: 512 px less 6 px padding each side = 500 px for 100 in, so 5 px per inch;
    // the ground sits at 10 px top padding + 40 in × 5 = 210 px; 20 in up is 210 − 100 = 110 px.
    const f = frame({ minX: 0, maxX: 100, maxY: 40 }, 512, 1);
    expect(f.s).toBe(5);
    expect(f.ground).toBe(210);
    expect(f.Y(20)).toBe(110);
    expect(f.ground - f.Y(20)).toBe(100);
    // 20 in behind the axle: 6 px padding + 20 × 5 = 106 px.
    expect(f.X(20)).toBe(106);
    // Height: ground 210 + 14 px to the first lane + one 22 px lane + 8 px = 254 px.
    expect(f.height).toBe(254);
  });

  it("never draws more than 7 px per inch, and centres a drawing narrower than the page", () => {
    // Statics: 100 in at 7 px/in = 700 px inside 2000 − 12 = 1988 px; (1988 − 700) / 2 = 644 px each side, plus 6 px padding.
    const f = frame({ minX: 0, maxX: 100, maxY: 40 }, 2000, 1);
    expect(f.s).toBe(7);
    expect(f.X(0)).toBe(650);
    expect(f.X(100)).toBe(1350);
  });

  it("places a trailer rig's parts where its figures put them", () => {
    const sc = buildScene(trailerInput);
    // Statics: fascia = pin 40 in − pin-to-fascia 5 in = 35 in behind the axle.
    expect(sc.fascia).toBe(35);
    // Ball = pin 40 in + no extender + ball mount 8 in = 48 in; platform = receiver 20 in − drop 4 in = 16 in.
    expect(sc.ball!.x).toBe(48);
    expect(sc.ball!.platform).toBe(16);
    // A 2 in ball on a 0.6 in neck: centre 16 + 0.6 + 1 = 17.6 in up.
    expect(sc.ball!.cy).toBeCloseTo(17.6, 9);
    expect(sc.coupler).toBe(16.5);
    expect(sc.assumed).toMatchObject({ receiverHeight: false, pinFromAxle: false, pinToFascia: false, mountLength: false, drop: false });
  });

  it("places an accessory's lowest point and its folded reach from its figures", () => {
    const sc = buildScene(rackInput);
    // Statics: lowest point height = receiver 20 + rise 2 − 8 below the shank top = 14 in (the accessory-fit check's H_r + r − h_low).
    expect(sc.low!.y).toBe(14);
    // Behind the axle: pin 40 + extender 6 + 20 behind the pin = 66 in.
    expect(sc.low!.x).toBe(66);
    // Folded it reaches 9 in ahead of its own pin hole at 46 in: front at 37 in; room = pin-to-fascia 5 + extender 6 = 11 in.
    expect(sc.foldFront).toBe(37);
    expect(sc.foldRoom).toBe(11);
  });

  it("assumes and says so for the parts not measured", () => {
    const sc = buildScene({ kind: "trailer", receiverSide: 2, extender: 0, ballDiameter: 2 });
    expect(Object.values(sc.assumed).slice(0, 5)).toEqual([true, true, true, true, true]);
  });

  it("splits a label into its name over its value and unit", () => {
    expect(splitLabel("receiver height 20.0 in")).toEqual(["receiver height", "20.0 in"]);
    expect(splitLabel("coupler 1,016 mm")).toEqual(["coupler", "1,016 mm"]);
  });

  for (const width of [330, 560, 820]) {
    it(`keeps every label clear of the tyre, of the edges and of every other label at ${width} px`, () => {
      for (const input of [trailerInput, rackInput]) {
        const sc = buildScene(input);
        const dims: DimSpec[] =
          input.kind === "trailer"
            ? [
                { id: "receiver-height", dir: "v", x: sc.tubeBack - 2.5, y1: 0, y2: sc.recv, label: "receiver height 20.0 in" },
                { id: "axle", dir: "h", x1: 0, x2: sc.ball!.x, lane: 0, label: "rear axle to ball 48.0 in" },
                { id: "fascia", dir: "h", x1: sc.fascia, x2: sc.pin, lane: 1, label: "pin hole to fascia 5.0 in" },
                { id: "mount", dir: "h", x1: sc.pin, x2: sc.ball!.x, lane: 2, label: "ball mount 8.0 in" },
                { id: "drop", dir: "v", x: sc.ball!.x - 3.2, y1: sc.recv, y2: sc.ball!.platform, label: "drop 4.0 in" },
                { id: "coupler", dir: "v", x: sc.ball!.x + 10, y1: 0, y2: sc.coupler!, label: "coupler 16.5 in" },
              ]
            : [
                { id: "receiver-height", dir: "v", x: sc.tubeBack - 2.5, y1: 0, y2: sc.recv, label: "receiver height 20.0 in" },
                { id: "axle", dir: "h", x1: 0, x2: sc.pin, lane: 0, label: "rear axle to pin hole 40.0 in" },
                { id: "fascia", dir: "h", x1: sc.fascia, x2: sc.pin, lane: 1, label: "pin hole to fascia 5.0 in" },
                { id: "low", dir: "h", x1: sc.mountPin, x2: sc.low!.x, lane: 2, label: "lowest point 20.0 in behind pin" },
                { id: "fold", dir: "h", x1: sc.foldFront!, x2: sc.mountPin, lane: 3, label: "fold clearance 9.0 in" },
                { id: "ground", dir: "v", x: sc.low!.x, y1: 0, y2: sc.low!.y, label: "ground clearance 14.0 in" },
              ];
        const f = frame(sc.extent, width, input.kind === "trailer" ? 3 : 4);
        const tyre = tyreBox(sc, f);
        const placed = layoutDims(dims, f, [tyre]);
        expect(placed.map((p) => p.id)).toEqual(dims.map((d) => d.id));
        for (const [i, a] of placed.entries()) {
          expect(overlaps(a.box, tyre), `${a.id} on the tyre`).toBe(false);
          expect(a.box.x).toBeGreaterThanOrEqual(0);
          expect(a.box.x + a.box.w).toBeLessThanOrEqual(width);
          if (a.dir === "v") expect(a.box.y + a.box.h, `${a.id} under the ground`).toBeLessThanOrEqual(f.ground);
          for (const b of placed.slice(i + 1)) expect(overlaps(a.box, b.box), `${a.id} on ${b.id}`).toBe(false);
        }
      }
    });
  }
});
