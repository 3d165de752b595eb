// zod's checks speak Stopwright's words wherever a schema gives none of its own, naming the field.
import { describe, expect, it } from "vitest";
import { z } from "zod";
import "@/lib/validation/messages";
import { fieldLabel, humanise } from "@/lib/validation/labels";
import { checkDocument } from "@/lib/spec/validate";
import { projectInputSchema } from "@/lib/spec/projects";
import * as scheme from "@/lib/estimate/scheme";
import * as document from "@/lib/spec/document";
import * as projects from "@/lib/spec/projects";
import * as committee from "@/lib/spec/committee";
import * as imports from "@/lib/spec/import";
import * as files from "@/lib/files/kinds";
import * as firm from "@/lib/validation/firm";
import * as quotations from "@/lib/validation/quotations";
import * as rateSets from "@/lib/validation/rate-sets";
import * as users from "@/lib/validation/users";
import * as commercial from "@/lib/quote/commercial";

const message = (schema: z.ZodType, value: unknown) => schema.safeParse(value).error!.issues[0]!.message;
const messageAt = (schema: z.ZodType, value: unknown, path: string) => schema.safeParse(value).error!.issues.find((i) => i.path.join(".") === path)?.message;

// zod's own English, as its default locale words its issues.
const ZOD_ENGLISH = /expected|received|Invalid input|Too small|Too big|Invalid (string|option|key|element|value)|Unrecognized key/i;

describe("messages of zod's checks", () => {
  it("name the field and say what it takes, in plain words", () => {
    expect(messageAt(scheme.stopFormSchema, { name: "Open Diapason", footage: "8", ranks: 0 }, "ranks")).toBe("Ranks: at least 1");
    const names = z.object({ name: z.string().max(80) });
    expect(message(names, { name: "x".repeat(81) })).toBe("Name: at most 80 characters");
    const wind = z.object({ windPressure: z.object({ value: z.number().int() }) });
    expect(message(wind, { windPressure: { value: 1.5 } })).toBe("Wind pressure: a whole number");
    expect(message(z.object({ notes: z.string().min(1) }), { notes: "" })).toBe("Notes: required");
    expect(message(z.object({ depthMm: z.number().min(-10).max(40) }), { depthMm: 41 })).toBe("Depth (mm): at most 40");
    expect(message(z.object({ count: z.number().positive() }), { count: 0 })).toBe("Count: more than 0");
    expect(message(z.object({ trunkLengthM: z.number() }), { trunkLengthM: "8" })).toBe("Main trunk (m): a number");
    expect(message(z.object({ clientName: z.string() }), {})).toBe("Client: required");
    expect(message(z.object({ unit: z.enum(["mm", "in"]) }), { unit: "cm" })).toBe("Unit: one of mm, in");
    expect(message(z.object({ couplers: z.array(z.string()).max(2) }), { couplers: ["a", "b", "c"] })).toBe("Couplers: at most 2 items");
    expect(message(z.object({ email: z.email() }), { email: "nobody" })).toBe("E-mail: not a valid e-mail address");
  });

  it("take the name from the schema's title where it has one, and the nearest named key for a bare value", () => {
    expect(message(z.object({ x: z.number().min(1).meta({ title: "Crew size" }) }), { x: 0 })).toBe("Crew size: at least 1");
    expect(fieldLabel(["divisions", 2, "stops", 4, "windPressure", "value"])).toBe("Wind pressure");
    expect(fieldLabel(["divisions", 0, "swellBox", "widthMm"])).toBe("Swell box width (mm)");
    expect(fieldLabel(["items", 0, "value"])).toBe("Items");
    expect(humanise("dummyPipeLengthMm")).toBe("Dummy pipe length (mm)");
    expect(message(z.number().min(1), 0)).toBe("At least 1");
  });

  it("leave a schema's own message alone, and give unions a hint of their own", () => {
    expect(message(z.string().max(3, "Too long for a code."), "abcd")).toBe("Too long for a code.");
    expect(message(z.object({ footage: z.union([z.string(), z.number()]) }), { footage: true })).toMatch(/^Pitch: not a footage; write a whole number of feet/);
    expect(message(z.object({ size: z.union([z.string(), z.number()]) }), { size: true })).toBe("Size: not a value this field takes");
  });

  it("reach the API's field errors: no zod wording in a refused project or scheme, and no field named twice", () => {
    const project = projectInputSchema.safeParse({ name: "x", clientName: "y", notes: "n".repeat(4001), temperatureC: 99 });
    const words = project.error!.issues.map((i) => i.message).join(" ");
    expect(words).toContain("Keep the notes under 4000 characters.");
    expect(words).toContain("Use a temperature from −10 to 40 °C.");
    const doc = checkDocument({
      name: "S",
      divisions: [{ id: "gt", name: "Great", keyboard: "manual", compass: { low: "C", high: "c''''" }, windPressure: { value: -1 }, stops: [{ id: "s1", name: "Principal", footage: "8", ranks: 0 }] }],
    });
    expect(doc.ok).toBe(false);
    const fields = (doc as { fields: Record<string, string[]> }).fields;
    const all = Object.values(fields).flat().join(" ");
    expect(all).not.toMatch(ZOD_ENGLISH);
    expect(fields["divisions.0.windPressure.value"]).toEqual(['Division "Great": Wind pressure: more than 0']);
    expect(fields["divisions.0.stops.0.ranks"]).toEqual(['Division "Great", stop "Principal": Ranks: at least 1']);
  });
});

// ---- Every schema the product parses input with, fed values of the wrong kind and size. ----

type Def = { type: string; shape?: Record<string, z.ZodType>; element?: z.ZodType; innerType?: z.ZodType; in?: z.ZodType; valueType?: z.ZodType; options?: z.ZodType[]; getter?: () => z.ZodType };

/** Bad values for a schema, from its definition: wrong types, too long, too large, too small, fractions. */
function badValues(schema: z.ZodType, depth = 0): unknown[] {
  const def = (schema as unknown as { _zod: { def: Def } })._zod.def;
  if (depth > 6) return [null];
  switch (def.type) {
    case "string":
      return [42, "", "x".repeat(20_001)];
    case "number":
    case "int":
      return ["8", 1.5, -1e15, 1e15];
    case "boolean":
      return ["yes"];
    case "enum":
    case "literal":
      return ["not-a-choice"];
    case "date":
      return ["yesterday"];
    case "object": {
      const shape = def.shape ?? {};
      const variants = [0, 1, 2, 3].map((i) => Object.fromEntries(Object.entries(shape).map(([k, child]) => { const b = badValues(child, depth + 1); return [k, b[i % b.length]]; })));
      return ["x", {}, ...variants];
    }
    case "array": {
      const inner = badValues(def.element!, depth + 1);
      return ["x", [], inner.slice(0, 3), Array.from({ length: 2_001 }, () => inner[0])];
    }
    case "record":
      return ["x", { k: badValues(def.valueType!, depth + 1)[0] }];
    case "union":
      return [true, ...(def.options ?? []).flatMap((o) => badValues(o, depth + 1).slice(0, 2))];
    case "optional":
    case "nullable":
    case "default":
    case "prefault":
    case "readonly":
    case "catch":
    case "nonoptional":
      return badValues(def.innerType!, depth);
    case "pipe":
      return badValues(def.in!, depth);
    case "lazy":
      return badValues(def.getter!(), depth + 1);
    default:
      return [Symbol("bad")];
  }
}

const modules = { scheme, document, projects, committee, imports, files, firm, quotations, rateSets, users, commercial };
const schemas = Object.entries(modules).flatMap(([m, exports]) =>
  Object.entries(exports)
    .filter(([, v]) => v instanceof z.ZodType)
    .map(([name, v]) => [`${m}.${name}`, v as z.ZodType] as const),
);

describe("every schema's messages", () => {
  it("finds the product's schemas", () => {
    expect(schemas.length).toBeGreaterThan(30);
  });

  it.each(schemas)("%s: our words, naming the field", (_name, schema) => {
    for (const value of badValues(schema)) {
      const ours = schema.safeParse(value);
      if (ours.success) continue;
      // The same parse with a marker in place of our wording: the issues whose words come from
      // lib/validation/messages.ts (not from the schema itself) are the ones marked.
      const marked = schema.safeParse(value, { error: () => "\u0000" });
      ours.error.issues.forEach((issue, i) => {
        if (process.env.SHOW_MESSAGES) console.log(issue.path.join("."), "=>", issue.message);
        expect(issue.message, `${issue.path.join(".")}`).not.toMatch(ZOD_ENGLISH);
        expect(issue.message.trim()).not.toBe("");
        const fromUs = marked.error!.issues[i]?.message === "\u0000";
        const label = fieldLabel(issue.path);
        if (fromUs && label) {
          expect(issue.message, issue.path.join(".")).toMatch(/^[^\s:][^:]*: \S/);
        }
      });
    }
  });
});
