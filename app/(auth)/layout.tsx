import Link from "next/link";
import type { ReactNode } from "react";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col gap-6 px-4 py-10">
      <Link href="/" className="font-display text-2xl text-leaf-800">
        Castline
      </Link>
      {children}
    </main>
  );
}
