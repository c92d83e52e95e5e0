import { LotShelf } from "@/lib/engine/lots";

// Shelf life default 60 days: Harit et al. 2014, J. Applied Horticulture 16(2).
const lot = (id: string, madeDay: number, amount: number) => ({
  id,
  madeDay,
  amount,
  binId: "bin-a",
  manure: false,
});

describe("LotShelf", () => {
  it("uses the oldest lot first", () => {
    const shelf = new LotShelf(60);
    shelf.add(lot("new", 20, 5));
    shelf.add(lot("old", 10, 5));
    expect(shelf.draw(25, 7)).toBe(7);
    const left = shelf.snapshot();
    expect(left.find((l) => l.id === "old")?.remaining).toBe(0);
    expect(left.find((l) => l.id === "new")?.remaining).toBe(3);
  });

  it("does not let a lot be used before the day it is made", () => {
    const shelf = new LotShelf(60);
    shelf.add(lot("a", 10, 5));
    expect(shelf.available(9)).toBe(0);
    expect(shelf.available(10)).toBe(5);
  });

  it("a lot made on day d is usable through d + 59 and gone on d + 60", () => {
    const shelf = new LotShelf(60);
    shelf.add(lot("a", 0, 5));
    expect(shelf.available(59)).toBe(5);
    expect(shelf.available(60)).toBe(0);
    expect(shelf.ageOutBefore(60)).toBe(5);
    expect(shelf.total()).toBe(0);
  });

  it("a one-day shelf (leachate) only serves the day of collection", () => {
    const shelf = new LotShelf(1);
    shelf.add(lot("l", 5, 2));
    expect(shelf.available(5)).toBe(2);
    expect(shelf.available(6)).toBe(0);
  });

  it("never draws more than it holds", () => {
    const shelf = new LotShelf(60);
    shelf.add(lot("a", 0, 2));
    expect(shelf.draw(1, 10)).toBe(2);
    expect(shelf.total()).toBe(0);
  });
});
