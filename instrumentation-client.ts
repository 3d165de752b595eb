// Runs in the browser before the app's own code: zod's settings (our messages, and no compiled
// parsers under the Content-Security-Policy) must be in place before any schema is built.
import "@/lib/validation/messages";
