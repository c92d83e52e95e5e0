import type { ReactNode } from "react";
import type { Role } from "@/lib/auth/roles";
import { AppHeader } from "./app-header";
import { GardenNav } from "./garden-nav";

/**
 * Header (with the garden switcher and, on phones, the menu), the garden's tab bar on
 * wide screens, then the page. The page or layout fetches the gardens and hands them
 * down: components never read the database (eslint.config.mjs).
 */
export function SignedInFrame({
  userName,
  gardens,
  garden,
  children,
}: {
  userName: string;
  gardens: { id: string; name: string }[];
  /** The garden being shown, and the signed-in person's role in it. */
  garden?: { id: string; role: Role };
  children: ReactNode;
}) {
  return (
    <>
      <AppHeader userName={userName} gardens={gardens} garden={garden} />
      {garden ? (
        <GardenNav gardenId={garden.id} role={garden.role} className="hidden md:block" />
      ) : null}
      {children}
    </>
  );
}
