// zod's checks speak Stopwright's words wherever a schema gives none of its own.
import { describe, expect, it } from "vitest";
import { z } from "zod";
import "@/lib/validation/messages";
import { checkDocument } from "@/lib/spec/validate";
import { projectInputSchema } from "@/lib/spec/projects";

const message = (schema: z.ZodType, value: unknown) => schema.safeParse(value).error!.issues[0]!.message;

describe("messages of zod's checks", () => {
  it("say what to do, in plain words", () => {
    expect(message(z.string().max(80), "x".repeat(81))).toBe("Keep this to at most 80 characters.");
    expect(message(z.string().min(1), "")).toBe("Fill this in.");
    expect(message(z.number().min(-10).max(40), 41)).toBe("Use a number no larger than 40.");
    expect(message(z.number().positive(), 0)).toBe("Use a number above 0.");
    expect(message(z.number(), "8")).toBe("Enter a number here.");
    expect(message(z.object({ a: z.string() }), {})).toBe("This is required.");
    expect(message(z.enum(["mm", "in"]), "cm")).toBe("Choose one of: mm, in.");
    expect(message(z.array(z.string()).max(2), ["a", "b", "c"])).toBe("At most 2 items are allowed here.");
  });

  it("leave a schema's own message alone, and a union's for the field hints", () => {
    expect(message(z.string().max(3, "Too long for a code."), "abcd")).toBe("Too long for a code.");
    expect(message(z.union([z.string(), z.number()]), true)).toBe("Invalid input");
  });

  it("reach the API's field errors: no zod wording in a refused project or scheme", () => {
    const project = projectInputSchema.safeParse({ name: "x", clientName: "y", notes: "n".repeat(4001), temperatureC: 99 });
    const words = project.error!.issues.map((i) => i.message).join(" ");
    expect(words).toContain("Keep the notes under 4000 characters.");
    expect(words).toContain("Use a temperature from −10 to 40 °C.");
    const doc = checkDocument({ name: "S", divisions: [{ id: "gt", name: "Great", keyboard: "manual", compass: { low: "C", high: "c''''" }, windPressure: { value: -1 }, stops: [] }] });
    expect(doc.ok).toBe(false);
    const all = Object.values((doc as { fields: Record<string, string[]> }).fields).flat().join(" ");
    expect(all).not.toMatch(/Too (big|small)|expected (string|number)|Invalid input/);
    expect(all).toMatch(/Use a number above 0/);
  });
});
