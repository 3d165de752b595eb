import type { Metadata } from "next";
import { NotFoundPage } from "@/components/ui/not-found-page";

export const metadata: Metadata = { title: "Not found" };

/** Any address that names nothing, or a project or scheme this user may not see (never told apart). */
export default function NotFound() {
  return <NotFoundPage />;
}
