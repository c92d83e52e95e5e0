// The time zones a garden may be in: every IANA zone this JavaScript runtime
// knows (ECMA-402 Intl.supportedValuesOf), plus "UTC", which the runtime
// lists only under its canonical "Etc/" spelling or not at all.

let cached: readonly string[] | null = null;

/** Every zone name a garden may use, sorted, "UTC" included. */
export function timeZoneNames(): readonly string[] {
  cached ??= [...new Set([...Intl.supportedValuesOf("timeZone"), "UTC"])].sort();
  return cached;
}

/** True when `name` is exactly one of {@link timeZoneNames} (aliases such as "US/Eastern" are not). */
export function isTimeZoneName(name: string): boolean {
  return timeZoneNames().includes(name);
}

/**
 * The listed spelling of a zone, or null for a name the runtime does not know. Intl
 * lists some zones under their older names ("Asia/Katmandu" in Node 20's ICU) while
 * browsers and people use the current ones ("Asia/Kathmandu"), so an alias is taken
 * and stored as the listed zone it stands for; offsets and made-up names are not.
 */
export function listedTimeZone(name: string): string | null {
  if (isTimeZoneName(name)) return name;
  try {
    const resolved = new Intl.DateTimeFormat("en-US", { timeZone: name }).resolvedOptions()
      .timeZone;
    return isTimeZoneName(resolved) ? resolved : null;
  } catch {
    return null;
  }
}

/** "America/Argentina/Buenos_Aires" → "America/Argentina/Buenos Aires", as a person reads it. */
export function timeZoneLabel(name: string): string {
  return name.replace(/_/g, " ");
}

/** The zone this runtime runs in (the browser's, on a client), or "UTC" when it is not one we offer. */
export function localTimeZone(): string {
  return listedTimeZone(Intl.DateTimeFormat().resolvedOptions().timeZone) ?? "UTC";
}
