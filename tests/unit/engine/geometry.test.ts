import { EngineInputError } from "@/lib/engine/core/errors";
import {
  bedAreaM2,
  bedVolumeL,
  containerVolumeL,
  NOMINAL_BOARDS,
  trayInsideFromOuter,
  trayInsideVolumeL,
  traySurfaceM2,
} from "@/lib/engine/supply/geometry";
import { fromSi, toSi } from "@/lib/units";

const inch = (n: number) => toSi(n, "in");

describe("nominal boards (American Softwood Lumber Standard PS 20, dry sizes)", () => {
  it.each([
    ["2x4", 1.5, 3.5],
    ["2x6", 1.5, 5.5],
    ["2x8", 1.5, 7.25],
    ["2x10", 1.5, 9.25],
    ["2x12", 1.5, 11.25],
    ["1x6", 0.75, 5.5],
    ["1x8", 0.75, 7.25],
  ] as const)("%s is %d × %d in", (board, t, w) => {
    expect(NOMINAL_BOARDS[board]).toEqual({ thicknessIn: t, widthIn: w });
  });
});

describe("tray built 24 × 20 in outside from 2×6 (PRODUCT.md worked example)", () => {
  const box = trayInsideFromOuter({ outerLengthM: inch(24), outerWidthM: inch(20), board: "2x6" });

  it("is 21 × 17 × 5½ in inside", () => {
    // inside = outside − 2 × 1½ in; depth = board width 5½ in (PS 20)
    expect(fromSi(box.lengthM, "in")).toBeCloseTo(21, 10);
    expect(fromSi(box.widthM, "in")).toBeCloseTo(17, 10);
    expect(fromSi(box.depthM, "in")).toBeCloseTo(5.5, 10);
  });

  it("holds ≈ 1,963.5 in³ ≈ 32.2 L", () => {
    const litres = trayInsideVolumeL(box);
    expect(fromSi(litres, "in3")).toBeCloseTo(1963.5, 6); // 21 × 17 × 5.5 = 1963.5 in³
    expect(litres).toBeCloseTo(32.2, 1); // 1963.5 × 16.387064 cm³ (NIST) = 32.176 L
  });

  it("has a worm surface of 21 × 17 in = 357 in²", () => {
    expect(fromSi(traySurfaceM2(box), "in2")).toBeCloseTo(357, 8);
  });
});

describe("containers and beds", () => {
  it("a cylinder pot 12 in across and 12 in deep holds π·6²·12 in³", () => {
    const litres = containerVolumeL({ kind: "cylinder", diameterM: inch(12), depthM: inch(12) });
    expect(fromSi(litres, "in3")).toBeCloseTo(Math.PI * 36 * 12, 6);
  });

  it("a 5-gallon pot entered by volume is 18.93 L (5 × 3.785411784 L, NIST)", () => {
    expect(containerVolumeL({ kind: "volume", volumeL: toSi(5, "gal") })).toBeCloseTo(
      18.92705892,
      8,
    );
  });

  it("an 8 × 4 ft raised bed is 32 ft², and 11 in deep holds 29⅓ ft³", () => {
    const ft = (n: number) => toSi(n, "ft");
    expect(fromSi(bedAreaM2({ lengthM: ft(8), widthM: ft(4) }), "ft2")).toBeCloseTo(32, 10);
    const litres = bedVolumeL({ lengthM: ft(8), widthM: ft(4), depthM: ft(11 / 12) });
    expect(fromSi(litres, "ft3")).toBeCloseTo(32 * (11 / 12), 8);
  });
});

describe("rejects impossible sizes, naming the field", () => {
  const fieldOf = (fn: () => unknown) => {
    try {
      fn();
    } catch (e) {
      expect(e).toBeInstanceOf(EngineInputError);
      return (e as EngineInputError).field;
    }
    throw new Error("expected an EngineInputError");
  };

  it("a 40 ft tray", () => {
    const field = fieldOf(() =>
      trayInsideVolumeL({ lengthM: toSi(40, "ft"), widthM: 0.5, depthM: 0.14 }, "bins[0].tray"),
    );
    expect(field).toBe("bins[0].tray.lengthM");
  });

  it("zero, negative and NaN sides", () => {
    expect(fieldOf(() => trayInsideVolumeL({ lengthM: 0.5, widthM: 0, depthM: 0.1 }))).toBe(
      "tray.widthM",
    );
    expect(fieldOf(() => bedAreaM2({ lengthM: -2, widthM: 1 }))).toBe("bed.lengthM");
    expect(fieldOf(() => containerVolumeL({ kind: "volume", volumeL: Number.NaN }))).toBe(
      "container.volumeL",
    );
  });

  it("an outside size no bigger than two boards", () => {
    const field = fieldOf(() =>
      trayInsideFromOuter({ outerLengthM: inch(3), outerWidthM: inch(20), board: "2x6" }),
    );
    expect(field).toBe("tray.outerLengthM");
  });

  it("an unknown board", () => {
    const field = fieldOf(() =>
      trayInsideFromOuter({ outerLengthM: inch(24), outerWidthM: inch(20), board: "3x7" as "2x6" }),
    );
    expect(field).toBe("tray.board");
  });
});
