// Runs once when the server starts. The Node-only check lives in its own module (Next's pattern for
// code that must not be analysed for the Edge runtime).
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") await import("./lib/startup-check");
}
