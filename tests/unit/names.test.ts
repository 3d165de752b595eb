// Names without Unicode's direction controls (Unicode Standard Annex #9): a name shows as it was meant.
import { describe, expect, it } from "vitest";
import { withoutDirectionControls } from "@/lib/validation/names";
import { newUserSchema } from "@/lib/validation/users";
import { inviteSchema } from "@/lib/spec/committee";
import { projectInputSchema } from "@/lib/spec/projects";

describe("names", () => {
  it("lose overrides, embeddings, isolates and marks, and keep right-to-left letters", () => {
    expect(withoutDirectionControls("Ada\u202Eelbats")).toBe("Adaelbats");
    expect(withoutDirectionControls("\u2066Bo\u2069 \u200Fb\u200E\u061C")).toBe("Bo b");
    expect(withoutDirectionControls("\u202A\u202B\u202C\u202D\u202E\u2067\u2068")).toBe("");
    expect(withoutDirectionControls("مريم Hilda שרה")).toBe("مريم Hilda שרה");
  });

  it("are stored without them by the user, committee and project schemas", () => {
    const user = newUserSchema.parse({ name: " Ada \u202Egnol ", email: "ada@example.test", role: "workshop", password: "a-long-password" });
    expect(user.name).toBe("Ada gnol");
    expect(inviteSchema.parse({ email: "a@example.test", name: "\u202EOrme" }).name).toBe("Orme");
    expect(projectInputSchema.parse({ name: "St \u202EAldric", clientName: "Parish" }).name).toBe("St Aldric");
  });

  it("count as empty when nothing but controls was typed", () => {
    const r = newUserSchema.safeParse({ name: "\u202E\u202C", email: "ada@example.test", role: "workshop", password: "a-long-password" });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.message).toBe("Enter the person's name.");
  });
});
