/** A number for explanation text: fixed decimals, trailing zeros dropped, never NaN. */
export function fmt(n: number, digits = 1): string {
  if (!Number.isFinite(n)) return "—";
  const s = n.toFixed(digits);
  return s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
}

export function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}
