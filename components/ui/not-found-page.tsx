import Link from "next/link";
import { StatusPage, StatusPicture } from "./status-page";

/** Nothing at this address, in Stopwright's words; shared by the root and signed-in not-found pages. */
export function NotFoundPage({ inApp = false }: { inApp?: boolean }) {
  return (
    <StatusPage
      inApp={inApp}
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
