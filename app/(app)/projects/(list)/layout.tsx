import { requirePageUser } from "@/lib/server/guard";

// Who may open the page is settled here, above its loading skeleton: once the skeleton has
// streamed the status is sent, and a redirect would no longer be one.
export default async function Layout({ children }: { children: React.ReactNode }) {
  await requirePageUser("projects:read", "/projects");
  return children;
}
