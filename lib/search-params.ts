/** A page's search parameters as Next hands them over. */
export type SearchParams = Record<string, string | string[] | undefined>;

/** One non-empty value of a search parameter, or undefined (a repeated or blank one counts as none). */
export function searchParam(raw: SearchParams, key: string): string | undefined {
  const value = raw[key];
  return typeof value === "string" && value ? value : undefined;
}
