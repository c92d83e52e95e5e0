import { Alert } from "@/components/ui";

/** The form-level message (not tied to one field), announced when it appears. */
export function FormMessage({ message }: { message: string | null }) {
  if (!message) return null;
  return (
    <Alert tone="danger" urgent>
      {message}
    </Alert>
  );
}
