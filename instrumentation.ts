// Runs once when the server starts: validate the configuration so a bad variable stops start-up
// with a message that names it, instead of failing on the first request.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { env } = await import("@/lib/env");
    env();
  }
}
