import Link from "next/link";
import { buttonStyles } from "@/components/ui";

export default function GardenNotFound() {
  return (
    <div className="flex flex-col gap-4 py-8">
      <h1 className="text-3xl">Not in this garden</h1>
      <p className="text-soil-700">
        It may have been deleted, or you may not be a member of this garden.
      </p>
      <Link className={buttonStyles({ variant: "secondary" }) + " self-start"} href="/gardens">
        Your gardens
      </Link>
    </div>
  );
}
