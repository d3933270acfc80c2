/**
 * Vessel geometry: inner volume, inner wall area, liquid volume and wetted wall area at a liquid
 * level, for a vertical or horizontal cylinder with heads, or a sphere.
 *
 * Heads: hemispherical (volume pi D^3 / 12, area pi D^2 / 2 each), 2:1 semi-ellipsoidal (half an
 * oblate spheroid of semi-axes D/2 and D/4: volume pi D^3 / 24, area pi a^2 (1 + (1 - e^2) /
 * e atanh e) with a = D/2, e = sqrt(3)/2, each) or flat. Partial volumes: a spherical cap
 * pi h^2 (3 R - h) / 3; a horizontal cylinder's circular segment R^2 acos((R - h)/R) - (R - h)
 * sqrt(2 R h - h^2) times its length; two heads of a horizontal cylinder together form an
 * ellipsoid of revolution, whose partial volume is the sphere's cap scaled by (head depth / R).
 * Wetted head area of a horizontal vessel: the head area times the wetted fraction of the
 * circumference (an approximation, stated in the result). Standard solid geometry.
 */
import { InputError } from "../../errors.js";
import { findRootBrent } from "../../numerics/brent.js";

/** Kind of the heads of a cylinder. */
export type HeadKind = "hemispherical" | "ellipsoidal-2:1" | "flat";

/** The vessel's inner shape (all lengths inner dimensions, m). */
export type VesselShape =
  | {
      readonly kind: "vertical-cylinder" | "horizontal-cylinder";
      /** Inner diameter, m. */
      readonly diameterM: number;
      /** Length of the straight (cylindrical) shell between the head tangent lines, m. */
      readonly lengthM: number;
      /** Default "ellipsoidal-2:1". */
      readonly heads?: HeadKind;
    }
  | { readonly kind: "sphere"; readonly diameterM: number }
  | {
      /**
       * A vessel given only by its volume (a vertical cylinder of height = 3 diameters is
       * assumed for areas and levels, stated in the result).
       */
      readonly kind: "volume";
      readonly volumeM3: number;
    };

/** Derived geometry of a shape. */
export interface VesselGeometry {
  readonly shape: VesselShape;
  /** m3 */
  readonly volumeM3: number;
  /** Inner wall area, m2. */
  readonly innerAreaM2: number;
  /** Height of the inside (vertical extent), m. */
  readonly heightM: number;
  /** The characteristic length of natural convection inside (m): the height for vertical walls, the diameter for horizontal cylinders and spheres. */
  readonly convectionLengthM: number;
  /** "vertical" or "horizontal" or "sphere" surfaces for the correlation choice. */
  readonly surface: "vertical" | "horizontal-cylinder" | "sphere";
  /** Liquid volume (m3) at a level (m above the bottom). */
  liquidVolumeAt(levelM: number): number;
  /** Wetted inner wall area (m2) at a level. */
  wettedAreaAt(levelM: number): number;
  /** Level (m) that holds a liquid volume (m3). */
  levelOf(liquidVolumeM3: number): number;
  /** Notes on approximations used (shown in results). */
  readonly notes: readonly string[];
}

function positive(input: string, v: unknown, unit: string): number {
  if (!(typeof v === "number" && v > 0 && Number.isFinite(v))) {
    throw new InputError({ input, unit, validRange: "a finite number > 0", received: v });
  }
  return v;
}

function headDepth(D: number, heads: HeadKind): number {
  return heads === "hemispherical" ? D / 2 : heads === "ellipsoidal-2:1" ? D / 4 : 0;
}

function headVolume(D: number, heads: HeadKind): number {
  return heads === "hemispherical"
    ? (Math.PI * D ** 3) / 12
    : heads === "ellipsoidal-2:1"
      ? (Math.PI * D ** 3) / 24
      : 0;
}

function headArea(D: number, heads: HeadKind): number {
  if (heads === "hemispherical") return (Math.PI * D * D) / 2;
  if (heads === "flat") return (Math.PI * D * D) / 4;
  const a = D / 2;
  const e = Math.sqrt(3) / 2;
  return Math.PI * a * a * (1 + ((1 - e * e) / e) * Math.atanh(e));
}

/** Volume of a sphere cap of radius R and height h (0 <= h <= 2R). */
function capVolume(R: number, h: number): number {
  return (Math.PI * h * h * (3 * R - h)) / 3;
}

/**
 * The geometry of a vessel shape.
 * @throws InputError for a non-positive dimension or an unknown shape or head kind.
 */
export function vesselGeometry(shape: VesselShape): VesselGeometry {
  if (typeof shape !== "object" || shape === null) {
    throw new InputError({
      input: "vessel.shape",
      unit: "-",
      validRange:
        '{ kind: "vertical-cylinder" | "horizontal-cylinder", diameterM, lengthM, heads? }, { kind: "sphere", diameterM } or { kind: "volume", volumeM3 }',
      received: shape,
    });
  }
  const notes: string[] = [];
  const levelCheck = (h: number, H: number): number => {
    if (!(h >= 0 && h <= H)) {
      throw new InputError({
        input: "levelM",
        unit: "m",
        validRange: `0 to the inner height ${H} m`,
        received: h,
      });
    }
    return h;
  };
  const finish = (g: Omit<VesselGeometry, "levelOf" | "notes" | "shape">): VesselGeometry => ({
    ...g,
    shape,
    notes,
    levelOf(vl: number): number {
      if (!(vl >= 0 && vl <= g.volumeM3 * (1 + 1e-12))) {
        throw new InputError({
          input: "liquidVolumeM3",
          unit: "m3",
          validRange: `0 to the vessel volume ${g.volumeM3} m3`,
          received: vl,
        });
      }
      if (vl === 0) return 0;
      if (vl >= g.volumeM3) return g.heightM;
      return findRootBrent((h) => g.liquidVolumeAt(h) - vl, 0, g.heightM, {
        tolerance: 1e-12 * g.heightM,
      }).value;
    },
  });
  if (shape.kind === "sphere") {
    const D = positive("vessel.shape.diameterM", shape.diameterM, "m");
    const R = D / 2;
    return finish({
      volumeM3: (Math.PI * D ** 3) / 6,
      innerAreaM2: Math.PI * D * D,
      heightM: D,
      convectionLengthM: D,
      surface: "sphere",
      liquidVolumeAt: (h) => capVolume(R, levelCheck(h, D)),
      wettedAreaAt: (h) => 2 * Math.PI * R * levelCheck(h, D),
    });
  }
  if (shape.kind === "volume") {
    const V = positive("vessel.shape.volumeM3", shape.volumeM3, "m3");
    // a vertical cylinder with flat ends, height 3 D
    const D = Math.cbrt((4 * V) / (3 * Math.PI));
    notes.push(
      `only the volume was given: areas and levels are those of a vertical cylinder with flat ends of height 3 x diameter (D = ${D.toPrecision(4)} m)`,
    );
    const H = 3 * D;
    const Ab = (Math.PI * D * D) / 4;
    return finish({
      volumeM3: V,
      innerAreaM2: Math.PI * D * H + 2 * Ab,
      heightM: H,
      convectionLengthM: H,
      surface: "vertical",
      liquidVolumeAt: (h) => Ab * levelCheck(h, H),
      wettedAreaAt: (h) => Ab + Math.PI * D * levelCheck(h, H),
    });
  }
  if (shape.kind !== "vertical-cylinder" && shape.kind !== "horizontal-cylinder") {
    throw new InputError({
      input: "vessel.shape.kind",
      unit: "-",
      validRange: '"vertical-cylinder", "horizontal-cylinder", "sphere" or "volume"',
      received: (shape as { kind?: unknown }).kind,
    });
  }
  const D = positive("vessel.shape.diameterM", shape.diameterM, "m");
  const L = positive("vessel.shape.lengthM", shape.lengthM, "m");
  const heads = shape.heads ?? "ellipsoidal-2:1";
  if (!(heads === "hemispherical" || heads === "ellipsoidal-2:1" || heads === "flat")) {
    throw new InputError({
      input: "vessel.shape.heads",
      unit: "-",
      validRange: '"hemispherical", "ellipsoidal-2:1" or "flat"',
      received: heads,
    });
  }
  const R = D / 2;
  const hd = headDepth(D, heads);
  const Vh = headVolume(D, heads);
  const Ah = headArea(D, heads);
  const volume = (Math.PI * D * D * L) / 4 + 2 * Vh;
  const area = Math.PI * D * L + 2 * Ah;
  if (shape.kind === "vertical-cylinder") {
    const H = L + 2 * hd;
    // one head's partial volume and area up to height h (0 <= h <= hd), bottom head
    const headPartial = (h: number): number =>
      hd === 0 ? 0 : (capVolume(hd, h) * R * R) / (hd * hd);
    const headWet = (h: number): number => (hd === 0 ? Ah : (Ah * h) / hd); // area ~ linear in depth (exact for the hemisphere)
    if (heads === "ellipsoidal-2:1") {
      notes.push(
        "wetted area of a 2:1 head at a partial depth taken proportional to the depth (exact for hemispheres)",
      );
    }
    return finish({
      volumeM3: volume,
      innerAreaM2: area,
      heightM: H,
      convectionLengthM: H,
      surface: "vertical",
      liquidVolumeAt(h) {
        levelCheck(h, H);
        if (h <= hd) return headPartial(h);
        if (h <= hd + L) return Vh + (Math.PI * D * D * (h - hd)) / 4;
        return volume - headPartial(H - h);
      },
      wettedAreaAt(h) {
        levelCheck(h, H);
        if (h <= hd) return headWet(h);
        if (h <= hd + L) return Ah + Math.PI * D * (h - hd);
        return area - headWet(H - h);
      },
    });
  }
  // horizontal
  notes.push(
    "horizontal vessel: wetted head area taken as the head area times the wetted fraction of the circumference",
  );
  const segment = (h: number): number =>
    R * R * Math.acos((R - h) / R) - (R - h) * Math.sqrt(Math.max(0, 2 * R * h - h * h));
  const headsPartial = (h: number): number => (hd === 0 ? 0 : (capVolume(R, h) * hd) / R);
  return finish({
    volumeM3: volume,
    innerAreaM2: area,
    heightM: D,
    convectionLengthM: D,
    surface: "horizontal-cylinder",
    liquidVolumeAt: (h) => {
      levelCheck(h, D);
      return segment(h) * L + headsPartial(h);
    },
    wettedAreaAt: (h) => {
      levelCheck(h, D);
      const frac = Math.acos((R - h) / R) / Math.PI;
      return frac * (Math.PI * D * L + 2 * Ah);
    },
  });
}
