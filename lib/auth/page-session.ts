import "server-only";
import { cookies } from "next/headers";
import { notFound, redirect } from "next/navigation";
import type { UserDto } from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import { SESSION_COOKIE } from "./cookies";
import { requireMembership, type Member } from "./require-role";
import type { Role } from "./roles";
import { userFromSessionToken } from "./session";

// The same checks as the route handlers, for server components: pages answer
// with a redirect to sign-in or our not-found page instead of a JSON error.

export async function getPageUser(): Promise<UserDto | null> {
  const store = await cookies();
  return userFromSessionToken(store.get(SESSION_COOKIE)?.value);
}

export async function requirePageUser(next?: string): Promise<UserDto> {
  const user = await getPageUser();
  if (!user) redirect(next ? `/sign-in?next=${encodeURIComponent(next)}` : "/sign-in");
  return user;
}

export async function requirePageMember(gardenId: string, minimum: Role): Promise<Member> {
  const user = await requirePageUser(`/g/${gardenId}`);
  try {
    return await requireMembership(user, gardenId, minimum);
  } catch (error) {
    if (error instanceof AppError && error.kind === "forbidden") redirect(`/g/${gardenId}`);
    notFound();
  }
}
