import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { parseScenario } from "@/lib/validation/scenario";

// Bad scenario files must give a clear error naming the JSON path (RULES.md).
const root = path.resolve(__dirname, "../../..");
const HOLLIS = path.join(root, "tests/fixtures/scenarios/hollis-street-garden.json");
const ALDER = path.join(root, "tests/fixtures/scenarios/alder-lane-community-plot.json");
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- tests poke arbitrary wrong values into the JSON
type Json = any;
const hollis = (): Json => JSON.parse(readFileSync(HOLLIS, "utf8"));

function issuesAfter(edit: (s: Json) => void): { path: string; message: string }[] {
  const s = hollis();
  edit(s);
  const r = parseScenario(s);
  return r.ok ? [] : r.issues;
}

describe("scenario schema", () => {
  it("accepts both example scenarios", () => {
    expect(parseScenario(hollis()).ok).toBe(true);
    expect(parseScenario(JSON.parse(readFileSync(ALDER, "utf8"))).ok).toBe(true);
  });

  it("rejects a negative size, naming the field", () => {
    const issues = issuesAfter((s) => (s.bins[1].tray.inside.length.value = -5));
    expect(issues.map((i) => i.path)).toEqual(["bins[1].tray.inside.length.value"]);
  });

  it("rejects an absurd size: a 400 ft bed (limit 100 m)", () => {
    const issues = issuesAfter((s) => (s.beds[0].length = { value: 400, unit: "ft" }));
    expect(issues[0]?.path).toBe("beds[0].length.value");
    expect(issues[0]?.message).toContain("at most 100 m");
  });

  it("rejects an unknown unit and a unit of the wrong kind", () => {
    const unknown = issuesAfter((s) => (s.bins[1].tray.inside.length.unit = "furlong"));
    expect(unknown[0]?.path).toBe("bins[1].tray.inside.length.unit");
    expect(unknown[0]?.message).toContain('unknown unit "furlong"');
    const wrongKind = issuesAfter((s) => (s.beds[0].length.unit = "lb"));
    expect(wrongKind[0]).toEqual({
      path: "beds[0].length.unit",
      message: '"lb" is a mass unit; expected a length unit',
    });
    const ruleUnit = issuesAfter((s) => (s.plantings[4].rule.amount.unit = "parsec"));
    expect(ruleUnit[0]?.path).toBe("plantings[4].rule.amount.unit");
  });

  it("rejects an RRULE the library cannot parse (RFC 5545 §3.3.10 FREQ values)", () => {
    const issues = issuesAfter((s) => (s.plantings[4].rule.recurrence = "FREQ=SOMETIMES"));
    expect(issues[0]?.path).toBe("plantings[4].rule.recurrence");
  });

  it("rejects a never-ending RRULE with no end date where no season bounds it (indoor bed)", () => {
    const issues = issuesAfter((s) => delete s.plantings[14].endDate);
    expect(issues[0]?.path).toBe("plantings[14].endDate");
    // Outdoors the season bounds it, so the same edit on an outdoor planting passes.
    expect(issuesAfter((s) => delete s.plantings[0].endDate)).toEqual([]);
  });

  it("rejects frost dates out of order and an unknown time zone", () => {
    expect(issuesAfter((s) => (s.settings.firstFallFrost = "03-01"))[0]?.path).toBe(
      "settings.firstFallFrost",
    );
    expect(issuesAfter((s) => (s.settings.timeZone = "Mars/Olympus"))[0]?.path).toBe(
      "settings.timeZone",
    );
  });

  it("rejects a planting in a bed that does not exist, and duplicate ids", () => {
    expect(issuesAfter((s) => (s.plantings[0].bedId = "nowhere"))[0]?.path).toBe(
      "plantings[0].bedId",
    );
    expect(issuesAfter((s) => (s.bins[1].id = s.bins[0].id))[0]?.path).toBe("bins[1].id");
  });
});

function plan(args: string[]) {
  const tsx = path.join(root, "node_modules/.bin/tsx");
  const r = spawnSync(tsx, [path.join(root, "scripts/plan.ts"), ...args], {
    cwd: root,
    encoding: "utf8",
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

describe("npm run plan", () => {
  it("prints a monthly table for a valid scenario", () => {
    const r = plan([HOLLIS, "--from", "2026-05", "--months", "3"]);
    expect(r.err).toBe("");
    expect(r.code).toBe(0);
    expect(r.out).toMatch(
      /month\s+opening\s+in\s+demand\s+allocated\s+aged out\s+closing\s+shortfall/,
    );
    expect(r.out).toContain("2026-07");
    expect(r.out).not.toMatch(/^2026-08/m); // no month row after the three asked for
    expect(r.out).not.toMatch(/NaN|Infinity/);
  }, 30_000);

  it("prints JSON with --format json", () => {
    const r = plan([ALDER, "--format", "json", "--months", "2"]);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out);
    // settings.asOf 2026-01-31 → the plan starts the day after.
    expect(out.months).toEqual(["2026-02", "2026-03"]);
    // Two months × two pools (castings, leachate).
    expect(out.rows).toHaveLength(4);
  }, 30_000);

  it("exits 1 naming the JSON path of a bad field", () => {
    const dir = mkdtempSync(path.join(tmpdir(), "castline-"));
    const file = path.join(dir, "bad.json");
    const s = hollis();
    s.bins[0].tray.outside.length.unit = "cubit";
    writeFileSync(file, JSON.stringify(s));
    const r = plan([file]);
    expect(r.code).toBe(1);
    expect(r.err).toContain("bins[0].tray.outside.length.unit");
    expect(r.out).toBe("");
  }, 30_000);

  it("exits 1 on bad options and on a file that is not JSON", () => {
    expect(plan([HOLLIS, "--from", "May"]).code).toBe(1);
    const dir = mkdtempSync(path.join(tmpdir(), "castline-"));
    const file = path.join(dir, "not.json");
    writeFileSync(file, "{ nope");
    const r = plan([file]);
    expect(r.code).toBe(1);
    expect(r.err).toContain("cannot read it as JSON");
  }, 30_000);
});
