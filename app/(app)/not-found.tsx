import type { Metadata } from "next";
import { NotFoundPage } from "@/components/ui/not-found-page";

export const metadata: Metadata = { title: "Not found" };

/** A project or scheme page that names nothing, under the signed-in header. */
export default function NotFoundInApp() {
  return <NotFoundPage inApp />;
}
