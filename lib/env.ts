/** The one place that reads process.env: parsed once with zod, so a missing setting fails loudly at start. */
import { z } from "zod";

const envSchema = z.object({
  DATABASE_URL: z.string().url().default("postgres://stopwright@127.0.0.1:54329/stopwright"),
  NEXTAUTH_URL: z.string().url().default("http://127.0.0.1:3000"),
  NEXTAUTH_SECRET: z.string().min(16).default("stopwright-local-development-secret"),
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function env(): Env {
  if (!cached) {
    const parsed = envSchema.safeParse(process.env);
    if (!parsed.success) {
      const lines = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
      throw new Error(`Stopwright settings are not valid:\n${lines.join("\n")}`);
    }
    cached = parsed.data;
  }
  return cached;
}
