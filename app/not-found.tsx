import type { Metadata } from "next";
import Link from "next/link";
import { StatusPage, StatusPicture } from "@/components/ui/status-page";

export const metadata: Metadata = { title: "Not found" };

/** Any address that names nothing, or a project or scheme this user may not see (never told apart). */
export default function NotFound() {
  return (
    <StatusPage
      testId="not-found"
      picture={<StatusPicture kind="missing" />}
      title="Nothing stands here"
      actions={
        <>
          <Link href="/projects" className="btn-primary">Projects</Link>
          <Link href="/" className="btn">Home</Link>
        </>
      }
    >
      <p>There is no page at this address. The project or scheme may have been removed, the link may be mistyped, or it may not be shared with you.</p>
      <p>If someone sent you the link, ask them to check it or to add you to the project.</p>
    </StatusPage>
  );
}
