"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { cn } from "@/components/ui";
import type { Role } from "@/lib/auth/roles";
import { gardenSections } from "./garden-sections";

/** The garden's sections as a tab bar under the header, on screens wide enough for it. */
export function GardenNav({
  gardenId,
  role,
  className,
}: {
  gardenId: string;
  role: Role;
  className?: string;
}) {
  const pathname = usePathname();
  return (
    <nav
      aria-label="Garden sections"
      className={cn("border-b border-loam-200 bg-loam-100", className)}
    >
      <ul className="mx-auto flex max-w-5xl gap-1 overflow-x-auto px-2">
        {gardenSections(gardenId, role, pathname).map((s) => (
          <li key={s.label}>
            <Link
              href={s.href}
              aria-current={s.active ? "page" : undefined}
              className={cn(
                "inline-flex min-h-11 items-center px-3 font-semibold",
                s.active
                  ? "border-b-4 border-leaf-700 text-leaf-900"
                  : "text-soil-700 hover:text-soil-900",
              )}
            >
              {s.label}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
