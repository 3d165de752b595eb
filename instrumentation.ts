/**
 * Runs once when a server process starts. A server without its settings (above all the secret that
 * signs sessions) stops here with a message saying what to set, instead of serving with a guessable key.
 * Then the mail worker starts sending queued mail (lib/mail): once per server process.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { checkServerSettings, isBuildPhase, SettingsError } = await import("@/lib/env");
  try {
    checkServerSettings();
  } catch (err) {
    if (err instanceof SettingsError) {
      console.error(`\n${err.message}\n`);
      process.exit(1);
    }
    throw err;
  }
  if (isBuildPhase()) return;
  const { startMailWorker } = await import("@/lib/mail/worker");
  void startMailWorker();
}
