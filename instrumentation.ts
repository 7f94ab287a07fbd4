// Runs once when the server starts: the app owns SIGTERM/SIGINT (NEXT_MANUAL_SIG_HANDLE=1)
// so it can close the embedded database cleanly before exiting.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { installShutdown } = await import("./db/client");
  installShutdown();
}
