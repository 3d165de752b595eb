/**
 * Survey files of a project: what may be uploaded, how it is described and linked, and the shapes the
 * API answers with. Pure: shared by the browser (upload form, gallery) and the server (checks).
 */
import { z } from "zod";

/** Types accepted, by their real content (sniffed on the server), with the names they may carry. */
export const acceptedTypes = {
  "image/jpeg": { extensions: ["jpg", "jpeg"], label: "JPEG photo", image: true },
  "image/png": { extensions: ["png"], label: "PNG image", image: true },
  "image/webp": { extensions: ["webp"], label: "WebP photo", image: true },
  "application/pdf": { extensions: ["pdf"], label: "PDF", image: false },
} as const;
export type AcceptedType = keyof typeof acceptedTypes;
export const acceptedTypeList = Object.keys(acceptedTypes) as AcceptedType[];

/** For the file picker: a hint only; the server decides by content. */
export const acceptAttribute = [...acceptedTypeList, ...acceptedTypeList.flatMap((t) => acceptedTypes[t].extensions.map((e) => `.${e}`))].join(",");

export const fileCategories = ["photo", "drawing", "document"] as const;
export type FileCategory = (typeof fileCategories)[number];
export const fileCategoryLabels: Record<FileCategory, string> = { photo: "Photo", drawing: "Drawing", document: "Document" };

export function extensionOf(name: string): string {
  const m = /\.([A-Za-z0-9]{1,8})$/.exec(name.trim());
  return m ? m[1]!.toLowerCase() : "";
}

/** The type a file name claims, or null when its extension is not one Stopwright keeps. */
export function typeForName(name: string): AcceptedType | null {
  const ext = extensionOf(name);
  return acceptedTypeList.find((t) => (acceptedTypes[t].extensions as readonly string[]).includes(ext)) ?? null;
}

export function defaultCategory(type: AcceptedType): FileCategory {
  return acceptedTypes[type].image ? "photo" : "drawing";
}

/** What a file is linked to: nothing, a division, or a stop, of one scheme of the project. */
export const fileLinkSchema = z
  .object({
    schemeId: z.uuid("Choose a scheme of this project."),
    divisionId: z.string().min(1).max(120).optional(),
    stopId: z.string().min(1).max(120).optional(),
  })
  .refine((l) => !(l.divisionId && l.stopId), "Link a file to a division or to a stop, not both.");
export type FileLink = z.output<typeof fileLinkSchema>;

const caption = z.string().trim().max(500, "Keep the caption under 500 characters.");

export const startUploadSchema = z.object({
  name: z.string().trim().min(1, "The file has no name.").max(200, "The file name is longer than 200 characters; rename it first."),
  size: z.number().int().positive("The file is empty."),
  caption: caption.default(""),
  category: z.enum(fileCategories).optional(),
  link: fileLinkSchema.nullable().default(null),
});
export type StartUpload = z.input<typeof startUploadSchema>;

export const fileUpdateSchema = z
  .object({
    caption: caption.optional(),
    category: z.enum(fileCategories).optional(),
    link: fileLinkSchema.nullable().optional(),
    sharedWithClient: z.boolean().optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), "Nothing to change.");
export type FileUpdate = z.input<typeof fileUpdateSchema>;

/** A stored file as the API answers it; links to the bytes are the app's own, checked on every use. */
export type SurveyFile = {
  id: string;
  projectId: string;
  name: string;
  contentType: AcceptedType;
  category: FileCategory;
  sizeBytes: number;
  width: number | null;
  height: number | null;
  caption: string;
  sharedWithClient: boolean;
  link: (FileLink & { schemeName: string; divisionName: string | null; stopName: string | null; missing: boolean }) | null;
  uploadedByName: string | null;
  createdAt: string;
  /** The app's address of the thumbnail (images only) and of the file itself. */
  thumbnailUrl: string | null;
  url: string;
};

/** What POST /api/projects/:id/files answers: where the browser PUTs the bytes, and for how long. */
export type UploadTicket = { fileId: string; uploadUrl: string; expiresInSeconds: number; maxBytes: number };

export function formatBytes(n: number): string {
  if (n < 1000) return `${n} bytes`;
  if (n < 1_000_000) return `${(n / 1000).toFixed(0)} kB`;
  return `${(n / 1_000_000).toFixed(1)} MB`;
}
