"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { cn } from "@/components/ui";
import type { Role } from "@/lib/auth/roles";

// Only sections that exist are listed; later features add theirs here.
const sections: { path: string; label: string; minimum: Role }[] = [
  { path: "", label: "Overview", minimum: "viewer" },
  { path: "/balance", label: "Balance", minimum: "viewer" },
  { path: "/beds", label: "Beds", minimum: "viewer" },
  { path: "/bins", label: "Bins", minimum: "viewer" },
  { path: "/stock", label: "Stock", minimum: "viewer" },
  { path: "/members", label: "Members", minimum: "viewer" },
  { path: "/settings", label: "Settings", minimum: "owner" },
];

const rank: Record<Role, number> = { viewer: 0, helper: 1, grower: 2, owner: 3 };

export function GardenNav({ gardenId, role }: { gardenId: string; role: Role }) {
  const pathname = usePathname();
  const base = `/g/${gardenId}`;
  return (
    <nav aria-label="Garden sections" className="border-b border-loam-200 bg-loam-100">
      <ul className="mx-auto flex max-w-5xl gap-1 overflow-x-auto px-2">
        {sections
          .filter((s) => rank[role] >= rank[s.minimum])
          .map((s) => {
            const href = base + s.path;
            const active = s.path ? pathname.startsWith(href) : pathname === base;
            return (
              <li key={s.label}>
                <Link
                  href={href}
                  aria-current={active ? "page" : undefined}
                  className={cn(
                    "inline-flex min-h-11 items-center px-3 font-semibold",
                    active
                      ? "border-b-4 border-leaf-700 text-leaf-900"
                      : "text-soil-700 hover:text-soil-900",
                  )}
                >
                  {s.label}
                </Link>
              </li>
            );
          })}
      </ul>
    </nav>
  );
}
