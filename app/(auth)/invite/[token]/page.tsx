import type { Metadata } from "next";
import Link from "next/link";
import { invitationProblem, lookupInvitation } from "@/db/queries/committee";
import { Wordmark } from "@/components/ui/logo";
import { StateMark } from "@/components/ui/state-mark";
import { formatDate } from "@/components/spec/format";
import { AcceptForm } from "./accept-form";

export const metadata: Metadata = { title: "Invitation", robots: { index: false } };

/** Public: the link in an invitation e-mail. The token is the only credential; it works once. */
export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const found = await lookupInvitation({ token });
  const problem = invitationProblem(found.state);
  return (
    <main className="grid min-h-screen place-items-center px-4">
      <div className="w-full max-w-md">
        <div className="mb-8 flex justify-center"><Wordmark /></div>
        <div className="panel p-6" data-testid="invitation" data-state={found.state}>
          {problem ? (
            <>
              <h1 className="mb-2 flex items-center gap-2 text-2xl font-semibold"><StateMark kind="caution" className="h-5 w-5 text-caution" />This link cannot be used</h1>
              <p className="mb-4 text-ink-soft" role="alert">{problem}</p>
              {found.projectName && <p className="mb-4 text-sm text-tin">Project: {found.projectName}</p>}
              <Link href="/sign-in" className="btn-primary">Go to sign-in</Link>
            </>
          ) : (
            <>
              <h1 className="mb-1 text-2xl font-semibold">Join the organ committee</h1>
              <p className="mb-4 text-sm text-ink-soft">
                You are invited to the committee&apos;s pages for <strong>{found.projectName}</strong>. Choose a password to sign in as{" "}
                <strong>{found.email}</strong>. The link works once, until {formatDate(found.expiresAt!)}.
              </p>
              <AcceptForm token={token} email={found.email!} name={found.name!} />
            </>
          )}
        </div>
      </div>
    </main>
  );
}
