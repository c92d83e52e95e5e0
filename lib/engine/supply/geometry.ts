import { toSi } from "@/lib/units";
import { EngineInputError, requirePositive } from "@/lib/engine/core/errors";

// Lengths in metres, volumes in litres, areas in m². The maxima catch typing
// slips (a 40 ft tray, a 400 m bed) rather than describe physics.

const INCH_M = toSi(1, "in"); // exact, NIST Handbook 44 App. C (lib/units)

export const GEOMETRY_LIMITS = {
  traySideM: 2,
  trayDepthM: 0.6,
  bedSideM: 100,
  bedDepthM: 2,
  containerVolumeL: 2000,
  containerSideM: 3,
} as const;

/**
 * Nominal boards → actual dry size in inches (thickness × width), American
 * Softwood Lumber Standard PS 20.
 */
export const NOMINAL_BOARDS = {
  "1x6": { thicknessIn: 0.75, widthIn: 5.5 },
  "1x8": { thicknessIn: 0.75, widthIn: 7.25 },
  "2x4": { thicknessIn: 1.5, widthIn: 3.5 },
  "2x6": { thicknessIn: 1.5, widthIn: 5.5 },
  "2x8": { thicknessIn: 1.5, widthIn: 7.25 },
  "2x10": { thicknessIn: 1.5, widthIn: 9.25 },
  "2x12": { thicknessIn: 1.5, widthIn: 11.25 },
} as const;
export type NominalBoard = keyof typeof NOMINAL_BOARDS;
export const nominalBoardNames = Object.keys(NOMINAL_BOARDS) as NominalBoard[];

export interface Box {
  lengthM: number;
  widthM: number;
  depthM: number;
}

function checkTray(box: Box, field: string): Box {
  return {
    lengthM: requirePositive(box.lengthM, `${field}.lengthM`, GEOMETRY_LIMITS.traySideM),
    widthM: requirePositive(box.widthM, `${field}.widthM`, GEOMETRY_LIMITS.traySideM),
    depthM: requirePositive(box.depthM, `${field}.depthM`, GEOMETRY_LIMITS.trayDepthM),
  };
}

/** Inside size of a tray built from a nominal board to an outside length × width. */
export function trayInsideFromOuter(
  input: { outerLengthM: number; outerWidthM: number; board: NominalBoard },
  field = "tray",
): Box {
  const board = NOMINAL_BOARDS[input.board];
  if (!board) {
    throw new EngineInputError(
      `${field}.board`,
      `unknown board "${String(input.board)}"; use one of ${nominalBoardNames.join(", ")}`,
    );
  }
  const t = board.thicknessIn * INCH_M;
  const outerL = requirePositive(
    input.outerLengthM,
    `${field}.outerLengthM`,
    GEOMETRY_LIMITS.traySideM,
  );
  const outerW = requirePositive(
    input.outerWidthM,
    `${field}.outerWidthM`,
    GEOMETRY_LIMITS.traySideM,
  );
  for (const [name, v] of [
    ["outerLengthM", outerL],
    ["outerWidthM", outerW],
  ] as const) {
    if (v <= 2 * t) {
      throw new EngineInputError(
        `${field}.${name}`,
        `must be more than twice the board thickness (${2 * t} m)`,
      );
    }
  }
  return { lengthM: outerL - 2 * t, widthM: outerW - 2 * t, depthM: board.widthIn * INCH_M };
}

/** Inside volume of a tray in litres (1 m³ = 1000 L). */
export function trayInsideVolumeL(box: Box, field = "tray"): number {
  const b = checkTray(box, field);
  return b.lengthM * b.widthM * b.depthM * 1000;
}

/** Worm surface: inside length × width of the active tray, m². */
export function traySurfaceM2(box: Pick<Box, "lengthM" | "widthM">, field = "tray"): number {
  const l = requirePositive(box.lengthM, `${field}.lengthM`, GEOMETRY_LIMITS.traySideM);
  const w = requirePositive(box.widthM, `${field}.widthM`, GEOMETRY_LIMITS.traySideM);
  return l * w;
}

export type ContainerShape =
  | { kind: "volume"; volumeL: number }
  | { kind: "cylinder"; diameterM: number; depthM: number }
  | { kind: "box"; lengthM: number; widthM: number; depthM: number };

/** Soil volume of a container in litres. */
export function containerVolumeL(shape: ContainerShape, field = "container"): number {
  const max = GEOMETRY_LIMITS.containerSideM;
  let litres: number;
  switch (shape.kind) {
    case "volume":
      litres = requirePositive(shape.volumeL, `${field}.volumeL`, GEOMETRY_LIMITS.containerVolumeL);
      break;
    case "cylinder": {
      const r = requirePositive(shape.diameterM, `${field}.diameterM`, max) / 2;
      litres = Math.PI * r * r * requirePositive(shape.depthM, `${field}.depthM`, max) * 1000;
      break;
    }
    case "box":
      litres =
        requirePositive(shape.lengthM, `${field}.lengthM`, max) *
        requirePositive(shape.widthM, `${field}.widthM`, max) *
        requirePositive(shape.depthM, `${field}.depthM`, max) *
        1000;
      break;
    default:
      throw new EngineInputError(`${field}.kind`, `must be "volume", "cylinder" or "box"`);
  }
  if (litres > GEOMETRY_LIMITS.containerVolumeL) {
    throw new EngineInputError(
      field,
      `holds ${Math.round(litres)} L, more than ${GEOMETRY_LIMITS.containerVolumeL} L`,
    );
  }
  return litres;
}

/** Surface of a container's soil (for per-area rules on pots), m². */
export function containerSurfaceM2(shape: ContainerShape, field = "container"): number | undefined {
  if (shape.kind === "cylinder") {
    const r =
      requirePositive(shape.diameterM, `${field}.diameterM`, GEOMETRY_LIMITS.containerSideM) / 2;
    return Math.PI * r * r;
  }
  if (shape.kind === "box") {
    return (
      requirePositive(shape.lengthM, `${field}.lengthM`, GEOMETRY_LIMITS.containerSideM) *
      requirePositive(shape.widthM, `${field}.widthM`, GEOMETRY_LIMITS.containerSideM)
    );
  }
  return undefined;
}

/** Bed area, m². */
export function bedAreaM2(bed: { lengthM: number; widthM: number }, field = "bed"): number {
  return (
    requirePositive(bed.lengthM, `${field}.lengthM`, GEOMETRY_LIMITS.bedSideM) *
    requirePositive(bed.widthM, `${field}.widthM`, GEOMETRY_LIMITS.bedSideM)
  );
}

/** Raised-bed soil volume, litres. */
export function bedVolumeL(bed: Box, field = "bed"): number {
  return (
    bedAreaM2(bed, field) *
    requirePositive(bed.depthM, `${field}.depthM`, GEOMETRY_LIMITS.bedDepthM) *
    1000
  );
}
