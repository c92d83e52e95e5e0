import Link from "next/link";
import { buttonStyles } from "@/components/ui";

export default function NotFound() {
  return (
    <main className="mx-auto flex max-w-xl flex-col gap-4 px-4 py-16">
      <p className="font-display text-2xl text-leaf-800">Castline</p>
      <h1 className="text-3xl">We could not find that page</h1>
      <p className="text-soil-700">
        The link may be old, or the garden may belong to someone who has not invited you.
      </p>
      <Link className={buttonStyles({ variant: "primary" }) + " self-start"} href="/gardens">
        Go to your gardens
      </Link>
    </main>
  );
}
