// Display helpers shared by pages. Dates here are floating calendar days
// ("YYYY-MM-DD"), formatted in UTC so a day never shifts with the viewer's zone.

export function formatDay(
  day: string,
  options: Intl.DateTimeFormatOptions = { month: "short", day: "numeric" },
): string {
  const date = new Date(`${day}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return day;
  return new Intl.DateTimeFormat("en-US", { ...options, timeZone: "UTC" }).format(date);
}
