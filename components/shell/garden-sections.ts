import { roleAtLeast, type Role } from "@/lib/auth/roles";

// Only sections that exist are listed; later features add theirs here. The tab bar
// (wide screens) and the header's menu (phones) both read this one list.
const sections: { path: string; label: string; minimum: Role }[] = [
  { path: "", label: "Overview", minimum: "viewer" },
  { path: "/balance", label: "Balance", minimum: "viewer" },
  { path: "/beds", label: "Beds", minimum: "viewer" },
  { path: "/bins", label: "Bins", minimum: "viewer" },
  { path: "/stock", label: "Stock", minimum: "viewer" },
  { path: "/members", label: "Members", minimum: "viewer" },
  { path: "/settings", label: "Settings", minimum: "owner" },
];

export interface GardenSection {
  href: string;
  label: string;
  active: boolean;
}

/** The sections this role may open in a garden, and which one the path is in. */
export function gardenSections(gardenId: string, role: Role, pathname: string): GardenSection[] {
  const base = `/g/${gardenId}`;
  return sections
    .filter((s) => roleAtLeast(role, s.minimum))
    .map((s) => {
      const href = base + s.path;
      const active = s.path ? pathname.startsWith(href) : pathname === base;
      return { href, label: s.label, active };
    });
}
