import Link from "next/link";
import { GardenSwitcher } from "./garden-switcher";
import { SignOutButton } from "./sign-out-button";

export function AppHeader({
  userName,
  gardens,
  currentGardenId,
}: {
  userName: string;
  gardens: { id: string; name: string }[];
  currentGardenId?: string;
}) {
  return (
    <header className="border-b border-loam-200 bg-white">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-3 px-4 py-2">
        <Link href="/gardens" className="font-display text-xl text-leaf-800">
          Castline
        </Link>
        <GardenSwitcher gardens={gardens} currentId={currentGardenId} />
        <div className="ml-auto flex items-center gap-1">
          <Link
            href="/account"
            className="rounded-control px-3 py-2 text-sm underline-offset-4 hover:underline"
          >
            {userName}
          </Link>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
