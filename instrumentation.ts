// Next.js calls register() once per server process before serving requests.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  // The auth secret is made here, when a server starts, never when a module loads
  // (that would happen during `next build` and write .data/auth-secret into the checkout).
  const { ensureAuthSecret } = await import("@/lib/auth/secret");
  ensureAuthSecret();
  const { startServer } = await import("@/services/startup");
  await startServer();
}
