// Next.js calls register() once per server process before serving requests.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { startServer } = await import("@/services/startup");
  await startServer();
}
