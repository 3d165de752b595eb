import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { Wordmark } from "@/components/ui/logo";
import { currentUser } from "@/lib/server/guard";
import { safeReturnPath } from "@/lib/server/params";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string }> }) {
  const { callbackUrl } = await searchParams;
  // Only same-site paths, so a crafted link cannot send someone elsewhere after sign-in.
  const target = safeReturnPath(typeof callbackUrl === "string" ? callbackUrl : undefined);
  if (await currentUser()) redirect(target);
  return (
    <main className="grid min-h-screen place-items-center px-4">
      <div className="w-full max-w-sm">
        <div className="mb-8 flex justify-center"><Wordmark /></div>
        <div className="panel p-6">
          <h1 className="mb-1 text-2xl font-semibold">Sign in</h1>
          <p className="mb-5 text-sm text-tin">Specifications, estimates and tenders for the organ workshop.</p>
          <SignInForm callbackUrl={target} />
        </div>
      </div>
    </main>
  );
}
