import type { ReactNode } from "react";
import { listGardensForUser } from "@/db/queries/memberships";
import type { UserDto } from "@/db/queries/users";
import { AppHeader } from "./app-header";

/** Header with the garden switcher, then the page. */
export async function SignedInFrame({
  user,
  currentGardenId,
  children,
}: {
  user: UserDto;
  currentGardenId?: string;
  children: ReactNode;
}) {
  const gardens = await listGardensForUser({ userId: user.id });
  return (
    <>
      <AppHeader userName={user.name} gardens={gardens} currentGardenId={currentGardenId} />
      {children}
    </>
  );
}
