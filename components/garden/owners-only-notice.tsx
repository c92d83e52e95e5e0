import Link from "next/link";
import { Alert } from "@/components/ui";

/** What a member below owner sees on Settings: why they cannot change it, and who can. */
export function OwnersOnlyNotice({
  gardenId,
  owners,
}: {
  gardenId: string;
  owners: { name: string; email: string }[];
}) {
  return (
    <Alert tone="info" title="Only owners change a garden's settings">
      <p>
        {owners.length === 1 ? "This garden's owner is " : "This garden's owners are "}
        {owners.map((o, i) => (
          <span key={o.email}>
            {i > 0 ? (i === owners.length - 1 ? " and " : ", ") : null}
            <strong>{o.name}</strong> ({o.email})
          </span>
        ))}
        . Ask them to change the name, units, time zone or frost dates, or to give you the owner
        role.
      </p>
      <p className="mt-2">
        <Link
          href={`/g/${gardenId}/members`}
          className="inline-flex min-h-11 items-center underline underline-offset-4"
        >
          See everyone in this garden
        </Link>
      </p>
    </Alert>
  );
}
