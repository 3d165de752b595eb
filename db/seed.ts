// Seeds the invented demo scenario. Idempotent: a second run changes nothing.
import bcrypt from "bcryptjs";
import { drizzle } from "drizzle-orm/node-postgres";
import { and, eq, sql } from "drizzle-orm";
import { Pool } from "pg";
import { stopTitle } from "../components/spec/format";
import { composeMail } from "../lib/mail/compose";
import { appOrigin, env } from "../lib/env";
import { INVITATION_DAYS } from "../lib/spec/committee";
import { schemeDocumentSchema } from "../lib/spec/document";
import { demoAccounts, demoCommittee, demoFirm } from "./demo-accounts";
import { demoDiscussion, demoProjects, restoreScheme } from "./demo-scenario";
import { newToken } from "./invitation-token";
import { DEFAULT_RATES } from "../lib/estimate/demo-rates";
import { svgToPng } from "../lib/documents/assets";
import { buildQuotation, formatQuoteNumber } from "../lib/quote/quotation";
import { addDays } from "../lib/quote/quotation";
import { insertScheme, type Store } from "./scheme-store";
import { parishSurveyFiles } from "./demo-files";
import { inspectFile } from "../lib/server/file-check";
import { fileKeys, writeObject } from "../lib/server/storage";
import { storageSettings } from "../lib/env";
import { acceptedTypes } from "../lib/files/kinds";
import { demoCommercial, demoLogoSvg } from "./demo-quotation";
import * as schema from "./schema";

async function main() {
  const pool = new Pool({ connectionString: env().DATABASE_URL });
  const db = drizzle(pool, { schema });
  const logo = await svgToPng(demoLogoSvg, 720);
  try {
    await db.transaction(async (tx) => {
      const firm = await tx.select().from(schema.firms).where(eq(schema.firms.name, demoFirm.name)).limit(1);
      if (!firm.length) {
        await tx.insert(schema.firms).values({ ...demoFirm, logoPng: logo.png.toString("base64"), logoWidth: logo.width, logoHeight: logo.height });
      }

      // The firm's rate book starts with the invented demo rates as its current set.
      let [rateSet] = await tx.select().from(schema.rateSets).where(eq(schema.rateSets.name, "Standard rates")).limit(1);
      if (!rateSet) {
        [rateSet] = await tx.insert(schema.rateSets).values({ name: "Standard rates", isCurrent: true }).returning();
        await tx.insert(schema.rateSetVersions).values({ rateSetId: rateSet!.id, version: 1, effectiveDate: "2027-01-01", rates: DEFAULT_RATES, note: "invented demo values" });
      }

      const byEmail = new Map<string, string>();
      const people = [...demoAccounts, ...demoCommittee.map((c) => ({ ...c, role: "client" as const }))];
      for (const a of people) {
        if (byEmail.has(a.email)) continue;
        const [existing] = await tx.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, a.email)).limit(1);
        const id = existing?.id ?? (await tx.insert(schema.users).values({ email: a.email, name: a.name, role: a.role, passwordHash: await bcrypt.hash(a.password, 10) }).returning())[0]!.id;
        byEmail.set(a.email, id);
      }
      const firmIds = demoAccounts.filter((a) => ["designer", "estimator", "workshop"].includes(a.role)).map((a) => byEmail.get(a.email)!);
      const designerId = byEmail.get(demoAccounts.find((a) => a.role === "designer")!.email)!;

      for (const demo of demoProjects) {
        const [existing] = await tx.select({ id: schema.projects.id }).from(schema.projects).where(eq(schema.projects.name, demo.project.name)).limit(1);
        if (existing) continue;
        const [project] = await tx.insert(schema.projects).values({ ...demo.project, createdById: designerId }).returning();
        // The firm's people work on every demo project; the committee sits on St Aldric's only.
        const committee = demo.project.name === demoDiscussion.project ? demoCommittee.map((c) => byEmail.get(c.email)!) : [];
        await tx.insert(schema.projectMembers).values([...firmIds, ...committee].map((userId) => ({ projectId: project!.id, userId })));
        const schemeIds: string[] = [];
        for (const [i, input] of demo.schemes.entries()) {
          const document = schemeDocumentSchema.parse(input);
          const scheme = await insertScheme(tx, { projectId: project!.id, document, authorId: designerId, note: "created" });
          schemeIds.push(scheme.id);
          if (demo.shared[i]) await tx.update(schema.schemes).set({ sharedWithClient: true, status: "proposed" }).where(eq(schema.schemes.id, scheme.id));
          if (input === restoreScheme) await seedQuotation(tx, { project: project!, scheme, document, rateSetId: rateSet!.id, estimatorId: byEmail.get(demoAccounts.find((a) => a.role === "estimator")!.email)! });
        }
        if (demo.project.name !== demoDiscussion.project) continue;

        // What the committee has said so far, an hour apart so the threads read in order.
        const at = (hoursAgo: number) => new Date(Date.now() - hoursAgo * 3600_000);
        const d = demoDiscussion;
        const label = (scheme: number, stopId: string | null) => {
          if (!stopId) return null;
          const doc = schemeDocumentSchema.parse(demo.schemes[scheme]);
          for (const div of doc.divisions) for (const s of div.stops) if (s.id === stopId) return `${stopTitle(s)} (${div.name})`;
          throw new Error(`demo discussion: no stop ${stopId}`);
        };
        await tx.insert(schema.schemeComments).values(
          d.comments.map((c, i) => ({ schemeId: schemeIds[c.scheme]!, stopId: c.stopId, stopLabel: label(c.scheme, c.stopId), authorId: byEmail.get(c.author)!, body: c.body, createdAt: at(48 - i * 5) })),
        );
        await tx.insert(schema.schemeNotes).values(
          d.notes.map((n) => ({ schemeId: schemeIds[n.scheme]!, stopId: n.stopId, stopLabel: label(n.scheme, n.stopId), authorId: byEmail.get(n.author)!, body: n.body, createdAt: at(20) })),
        );
        await tx.insert(schema.schemePreferences).values(
          d.preferences.map((p, i) => ({ projectId: project!.id, userId: byEmail.get(p.author)!, schemeId: schemeIds[p.scheme]!, note: p.note, updatedAt: at(10 - i * 3) })),
        );
        // An invitation still open, with its message in the outbox (sent by the app's mail worker once it runs).
        const { token, tokenHash } = newToken();
        await tx.insert(schema.invitations).values({
          projectId: project!.id, email: d.invitation.email, name: d.invitation.name, tokenHash, invitedById: designerId,
          expiresAt: new Date(Date.now() + INVITATION_DAYS * 24 * 3600_000),
        });
        const mail = composeMail({
          greeting: `Dear ${d.invitation.name},`,
          paragraphs: [
            `Tobias Quell of ${demoFirm.name} invites you to the organ committee's pages for ${demo.project.name} in Stopwright.`,
            `Follow the link to choose a password. It works once, and for ${INVITATION_DAYS} days.`,
          ],
          links: [{ label: "Accept the invitation", url: `${appOrigin()}/invite/${token}` }],
          signature: demoFirm.name,
        });
        await tx.insert(schema.outgoingMail).values({ kind: "invitation", to: [d.invitation.email], subject: `Invitation: ${demo.project.name} — organ committee`, ...mail });
      }
      const workshop = demoAccounts.find((a) => a.role === "workshop")!;
      await seedSurveyFiles(tx, demoProjects[0]!.project.name, byEmail.get(workshop.email)!);
    });
    console.log("demo data in place");
  } finally {
    await pool.end();
  }
}

/**
 * The parish's survey files, stored the way an upload is (checked by content, thumbnail made, the
 * server's own keys), once: a project that already has files is left alone.
 */
async function seedSurveyFiles(tx: Store, projectName: string, uploaderId: string) {
  const [project] = await tx.select({ id: schema.projects.id }).from(schema.projects).where(eq(schema.projects.name, projectName)).limit(1);
  if (!project) return;
  const [any] = await tx.select({ id: schema.projectFiles.id }).from(schema.projectFiles).where(eq(schema.projectFiles.projectId, project.id)).limit(1);
  if (any) return;
  const [schemeA] = await tx
    .select({ id: schema.schemes.id })
    .from(schema.schemes)
    .where(and(eq(schema.schemes.projectId, project.id), eq(schema.schemes.name, restoreScheme.name)))
    .limit(1);
  const { maxBytes } = storageSettings();
  for (const f of parishSurveyFiles) {
    const bytes = await f.bytes();
    const checked = await inspectFile(f.name, bytes, maxBytes);
    if (!checked.ok) throw new Error(`demo file ${f.name}: ${checked.message}`);
    const id = crypto.randomUUID();
    const objectKey = fileKeys.originalKey(project.id, id, acceptedTypes[checked.type].extensions[0]);
    await writeObject(objectKey, bytes, checked.type);
    const thumbnailKey = checked.thumbnail ? fileKeys.thumbnailKey(project.id, id) : null;
    if (thumbnailKey) await writeObject(thumbnailKey, checked.thumbnail!, "image/jpeg");
    await tx.insert(schema.projectFiles).values({
      id,
      projectId: project.id,
      status: "ready",
      uploadKey: fileKeys.uploadKey(project.id, id),
      objectKey,
      thumbnailKey,
      originalName: f.name,
      contentType: checked.type,
      category: f.category,
      sizeBytes: bytes.length,
      width: checked.width,
      height: checked.height,
      caption: f.caption,
      schemeId: f.link && schemeA ? schemeA.id : null,
      divisionId: f.link?.divisionId ?? null,
      stopId: f.link?.stopId ?? null,
      sharedWithClient: !!f.shared,
      uploadedById: uploaderId,
      completedAt: new Date(),
    });
  }
}

/** The demo's issued quotation of scheme A: issued today, valid for its 90 days, frozen like any other. */
async function seedQuotation(tx: Store, v: { project: schema.Project; scheme: schema.Scheme; document: ReturnType<typeof schemeDocumentSchema.parse>; rateSetId: string; estimatorId: string }) {
  const [version] = await tx.select().from(schema.rateSetVersions).where(and(eq(schema.rateSetVersions.rateSetId, v.rateSetId), eq(schema.rateSetVersions.version, 1))).limit(1);
  const [firm] = await tx.select().from(schema.firms).limit(1);
  const estimator = demoAccounts.find((a) => a.role === "estimator")!;
  const issuedOn = new Date().toISOString().slice(0, 10);
  const year = new Date().getUTCFullYear();
  const [counter] = await tx
    .insert(schema.quoteCounters)
    .values({ year, last: 1 })
    .onConflictDoUpdate({ target: schema.quoteCounters.year, set: { last: sql`${schema.quoteCounters.last} + 1` } })
    .returning();
  const number = formatQuoteNumber(year, counter!.last);
  const quotation = buildQuotation({
    number, status: "issued", issuedOn, validUntil: addDays(issuedOn, demoCommercial.validityDays),
    preparedBy: { name: estimator.name, email: estimator.email },
    firm: {
      name: firm!.name, address: firm!.address, email: firm!.email, phone: firm!.phone, website: firm!.website, registration: firm!.registration,
      logo: firm!.logoPng ? { png: firm!.logoPng, width: firm!.logoWidth!, height: firm!.logoHeight! } : null,
    },
    client: { projectName: v.project.name, clientName: v.project.clientName, venue: v.project.venue, location: v.project.location, instrument: v.project.instrument, targetDate: v.project.targetDate },
    scheme: { id: v.scheme.id, name: v.document.name, description: v.document.description, version: v.scheme.version, tuning: { pitchHz: v.project.pitchHz, temperatureC: v.project.temperatureC }, document: v.document },
    rateSet: { name: "Standard rates", version: 1, effectiveDate: version!.effectiveDate, rates: DEFAULT_RATES },
    commercial: demoCommercial,
  });
  await tx.insert(schema.quotations).values({
    projectId: v.project.id, schemeId: v.scheme.id, schemeVersion: v.scheme.version, rateSetVersionId: version!.id, number, status: "issued", version: 2,
    commercial: demoCommercial, snapshot: quotation, validUntil: quotation.validUntil, issuedAt: new Date(), issuedById: v.estimatorId, createdById: v.estimatorId,
  });
}

main().catch((err) => {
  console.error(`seeding failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
