import Link from "next/link";
import type { Role } from "@/lib/auth/roles";
import { CastlineMark } from "./castline-mark";
import { GardenSwitcher } from "./garden-switcher";
import { ShellMenu } from "./shell-menu";
import { SignOutButton } from "./sign-out-button";

/**
 * One row at every width (56 px): mark, garden switcher, then the account links on a
 * wide screen or a menu button on a narrow one (the menu also holds the sections).
 */
export function AppHeader({
  userName,
  gardens,
  garden,
}: {
  userName: string;
  gardens: { id: string; name: string }[];
  garden?: { id: string; role: Role };
}) {
  return (
    <header className="relative border-b border-loam-200 bg-white">
      <div className="mx-auto flex h-14 max-w-5xl items-center gap-2 px-3 sm:gap-3 sm:px-4">
        <Link
          href="/gardens"
          aria-label="Castline: all gardens"
          className="flex min-h-11 shrink-0 items-center gap-2 rounded-control font-display text-xl text-leaf-800"
        >
          <CastlineMark />
          <span className="hidden sm:inline">Castline</span>
        </Link>
        <GardenSwitcher
          gardens={gardens}
          currentId={garden?.id}
          className="min-w-0 flex-1 sm:max-w-xs"
        />
        <div className="ml-auto hidden shrink-0 items-center gap-1 md:flex">
          <Link
            href="/account"
            className="inline-flex min-h-11 max-w-48 items-center truncate rounded-control px-3 text-sm underline-offset-4 hover:underline"
          >
            {userName}
          </Link>
          <SignOutButton />
        </div>
        <ShellMenu userName={userName} garden={garden} className="ml-auto shrink-0 md:hidden" />
      </div>
    </header>
  );
}
