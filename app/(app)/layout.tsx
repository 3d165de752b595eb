import Link from "next/link";
import type { ReactNode } from "react";
import { SignOutButton } from "@/components/ui/sign-out-button";
import { Wordmark } from "@/components/ui/logo";
import { can, roleLabels } from "@/lib/roles";
import { requirePageUser } from "@/lib/server/guard";

export default async function SignedInLayout({ children }: { children: ReactNode }) {
  const user = await requirePageUser();
  const links = [
    { href: "/", label: "Home", show: true },
    { href: "/projects", label: "Projects", show: can(user.role, "projects:read") },
    { href: "/rates", label: "Rate book", show: can(user.role, "rates:manage") },
    { href: "/admin/users", label: "Users", show: can(user.role, "users:manage") },
    { href: "/admin/firm", label: "Firm details", show: can(user.role, "firm:manage") },
    { href: "/admin/mail", label: "Outgoing mail", show: can(user.role, "mail:read") },
  ].filter((l) => l.show);
  // The header's links are not prefetched: on every page load they would render Home and Projects on
  // the server and parse them in the browser while the page itself is still loading (the editor too).
  return (
    <div className="min-h-screen">
      <header className="border-b border-tin-rule bg-paper-card/80 print:hidden">
        <div className="mx-auto flex max-w-[1600px] flex-wrap items-center gap-x-6 gap-y-1 px-5 py-2.5">
          <Link href="/" prefetch={false} aria-label="Stopwright home"><Wordmark /></Link>
          <nav aria-label="Main" className="flex flex-wrap gap-1 text-sm">
            {links.map((l) => (
              <Link key={l.href} href={l.href} prefetch={false} className="rounded px-2.5 py-1 text-ink-soft hover:bg-paper-deep hover:text-ink">
                {l.label}
              </Link>
            ))}
          </nav>
          <div className="ml-auto flex items-center gap-3 text-sm">
            <span className="text-right leading-tight">
              <span className="block font-medium" data-testid="user-name">{user.name}</span>
              <span className="block text-xs text-tin" data-testid="user-role">{roleLabels[user.role]}</span>
            </span>
            <SignOutButton />
          </div>
        </div>
      </header>
      <main className="mx-auto max-w-[1600px] px-5 py-6">{children}</main>
    </div>
  );
}
