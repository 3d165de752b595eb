import Link from "next/link";
import { roleLabels } from "@/lib/roles";
import { requirePageUser } from "@/lib/server/guard";

export default async function ForbiddenPage() {
  const user = await requirePageUser();
  return (
    <div className="panel mx-auto max-w-lg p-6">
      <h1 className="mb-2 text-2xl font-semibold">Not open to your role</h1>
      <p className="text-sm text-ink-soft">
        That page is not available to the {roleLabels[user.role]} role. If you need it, ask your firm&apos;s administrator.
      </p>
      <Link href="/" className="btn mt-4">Back to home</Link>
    </div>
  );
}
