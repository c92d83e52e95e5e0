import type { ReactNode } from "react";

// Signed-in pages. Each page checks the session and role itself (layouts are
// not a security boundary in the App Router: they do not re-run on navigation).
export default function SignedInLayout({ children }: { children: ReactNode }) {
  return <div className="min-h-dvh">{children}</div>;
}
