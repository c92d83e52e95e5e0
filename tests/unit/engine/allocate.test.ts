import {
  allocateByTiers,
  grantMonth,
  orderIntoTiers,
  splitTier,
  type Claim,
} from "@/lib/engine/allocate";

// The order is PRODUCT.md "Balance (the heart)": priority, then feeder class
// (heavy > medium > light), then due date; a tier is split pro rata.
const claim = (ref: number, over: Partial<Claim> = {}): Claim => ({
  ref,
  priority: 1,
  feederClass: "medium",
  day: 100,
  need: 1,
  ...over,
});

describe("orderIntoTiers", () => {
  it("orders by priority first, then feeder class, then due date", () => {
    const tiers = orderIntoTiers([
      claim(0, { priority: 2, feederClass: "heavy", day: 1 }),
      claim(1, { priority: 1, feederClass: "light", day: 1 }),
      claim(2, { priority: 1, feederClass: "heavy", day: 9 }),
      claim(3, { priority: 1, feederClass: "heavy", day: 5 }),
    ]);
    expect(tiers.map((t) => t.map((c) => c.ref))).toEqual([[3], [2], [1], [0]]);
  });

  it("groups claims equal on all three keys into one tier", () => {
    const tiers = orderIntoTiers([claim(0), claim(1), claim(2, { day: 101 })]);
    expect(tiers.map((t) => t.length)).toEqual([2, 1]);
  });
});

describe("splitTier", () => {
  it("gives everyone their need when stock suffices", () => {
    expect(splitTier([claim(0, { need: 2 }), claim(1, { need: 3 })], 10)).toEqual([2, 3]);
  });

  it("splits a short tier pro rata to need: 2 and 6 wanted, 4 on hand → 1 and 3", () => {
    // 4 / 8 = one half of each need (arithmetic).
    expect(splitTier([claim(0, { need: 2 }), claim(1, { need: 6 })], 4)).toEqual([1, 3]);
  });

  it("gives nothing when nothing is on hand", () => {
    expect(splitTier([claim(0, { need: 2 })], 0)).toEqual([0]);
  });
});

describe("allocateByTiers", () => {
  it("fills the first tier in full before the next gets anything", () => {
    const grants = allocateByTiers(
      [
        claim(0, { priority: 2, need: 5 }),
        claim(1, { priority: 1, feederClass: "light", need: 3 }),
        claim(2, { priority: 1, feederClass: "heavy", need: 4 }),
      ],
      6,
    );
    // heavy p1 gets 4, light p1 gets the 2 left, p2 gets 0.
    expect(grants.get(2)).toBe(4);
    expect(grants.get(1)).toBe(2);
    expect(grants.get(0)).toBe(0);
  });

  it("never grants more than is available in total", () => {
    const grants = allocateByTiers([claim(0, { need: 5 }), claim(1, { need: 5, day: 3 })], 7);
    const sum = [...grants.values()].reduce((a, b) => a + b, 0);
    expect(sum).toBeCloseTo(7, 12);
  });
});

describe("grantMonth", () => {
  // Lots usable for 60 days (Harit et al. 2014); days are day numbers.
  const lots = [
    { madeDay: 0, remaining: 4 },
    { madeDay: 10, remaining: 10 },
  ];

  it("serves the higher tier first but routes it to stock the lower tier cannot use", () => {
    const tiers = orderIntoTiers([
      claim(0, { priority: 3, day: 5, need: 4 }),
      claim(1, { priority: 1, day: 20, need: 4 }),
    ]);
    const g = grantMonth(lots, 60, tiers);
    expect(g.get(1)).toBe(4);
    expect(g.get(0)).toBe(4); // only lot 0 (4 kg) is usable on day 5, and it is left for it
  });

  it("caps a tier by what its own days can reach, after higher tiers", () => {
    const tiers = orderIntoTiers([
      claim(0, { priority: 1, day: 5, need: 3 }),
      claim(1, { priority: 2, day: 6, need: 3 }),
    ]);
    const g = grantMonth(lots, 60, tiers);
    expect(g.get(0)).toBe(3);
    expect(g.get(1)).toBe(1); // 4 kg usable before day 10, 3 already granted
  });

  it("grants nothing where no lot is usable", () => {
    const g = grantMonth(
      [{ madeDay: 10, remaining: 5 }],
      60,
      orderIntoTiers([claim(0, { day: 5, need: 2 })]),
    );
    expect(g.get(0)).toBe(0);
  });
});
