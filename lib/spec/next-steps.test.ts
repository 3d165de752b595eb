import { describe, expect, it } from "vitest";
import { committeeNextSteps, currentTender, type SentTender } from "./next-steps";

const base = { status: "design" as const, firmName: "Invented Organ Works", sharedSchemes: [] as string[], tenders: [] as SentTender[], hasPreference: false, formatDate: (d: string) => `«${d}»` };
const tender = (over: Partial<SentTender>): SentTender => ({ number: "Q-1", schemeName: "Scheme A", status: "issued", validUntil: "2028-09-30", sentAt: "2028-07-01T10:00:00Z", ...over });

describe("what happens next, for the committee", () => {
  it("follows the project from schemes being prepared to a tender sent", () => {
    expect(committeeNextSteps(base).now).toBe("Invented Organ Works is preparing schemes for your organ.");
    expect(committeeNextSteps({ ...base, sharedSchemes: ["A", "B"] }).now).toMatch(/2 schemes are ready for you to read\.$/);
    expect(committeeNextSteps({ ...base, sharedSchemes: ["A"] }).steps[0]).toMatch(/^Read the scheme shared with you/);
    expect(committeeNextSteps({ ...base, status: "tender", sharedSchemes: ["A"] }).now).toMatch(/is preparing a tender/);
    const sent = committeeNextSteps({ ...base, status: "tender", sharedSchemes: ["A"], tenders: [tender({})] });
    expect(sent.now).toBe("Invented Organ Works has sent you tender Q-1 for Scheme A, valid until «2028-09-30».");
    expect(sent.steps.join(" ")).toMatch(/reply to the e-mail/);
  });

  it("says when a tender lapsed or was answered, and what the firm does after the contract", () => {
    expect(committeeNextSteps({ ...base, tenders: [tender({ status: "lapsed" })] }).now).toBe("The tender Q-1 for Scheme A lapsed on «2028-09-30».");
    expect(committeeNextSteps({ ...base, tenders: [tender({ status: "accepted" })] }).now).toMatch(/accepted tender Q-1/);
    expect(committeeNextSteps({ ...base, status: "workshop" }).now).toMatch(/in its workshop/);
    // Site work: heights and scaffolds, so the usual caution (common practice, no source).
    expect(committeeNextSteps({ ...base, status: "site" }).steps[0]).toMatch(/Keep clear of scaffolding/);
    expect(committeeNextSteps({ ...base, firmName: " " }).now).toMatch(/^The firm is preparing/);
  });

  it("takes the open tender that was sent last, and never one that was not sent", () => {
    const older = tender({ number: "Q-1", sentAt: "2028-01-01T00:00:00Z" });
    const newer = tender({ number: "Q-2", sentAt: "2028-03-01T00:00:00Z" });
    const lapsedLater = tender({ number: "Q-3", status: "lapsed", sentAt: "2028-04-01T00:00:00Z" });
    expect(currentTender([older, newer, lapsedLater])?.number).toBe("Q-2");
    expect(currentTender([lapsedLater])?.number).toBe("Q-3");
    expect(currentTender([tender({ sentAt: null })])).toBeNull();
  });
});
