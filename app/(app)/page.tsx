import type { Metadata } from "next";
import Link from "next/link";
import { listProjectsForUser } from "@/db/queries/projects";
import { can, roleLabels, type Role } from "@/lib/roles";
import { requirePageUser } from "@/lib/server/guard";
import { projectStatusLabels } from "@/lib/spec/projects";

export const metadata: Metadata = { title: "Home" };

type Tile = { title: string; text: string; href?: string };

const homes: Record<Role, { heading: string; lead: string; tiles: Tile[] }> = {
  admin: {
    heading: "Firm administration",
    lead: "People, roles and the firm's details.",
    tiles: [
      { title: "Users and roles", text: "Add colleagues and committee members, change roles, disable accounts.", href: "/admin/users" },
      { title: "Firm details", text: "Name, address, contact and logo, as the tender's cover shows them.", href: "/admin/firm" },
      { title: "Rate book", text: "Hourly rates, material prices, labour norms and percentages, in versions.", href: "/rates" },
      { title: "Projects", text: "Every instrument job of the firm.", href: "/projects" },
    ],
  },
  designer: {
    heading: "Specifications",
    lead: "Draft stop lists for new organs and rebuilds; the figures follow as you work.",
    tiles: [{ title: "Projects", text: "Open a project to draft or compare its schemes.", href: "/projects" }],
  },
  estimator: {
    heading: "Estimates and quotations",
    lead: "Price schemes from the firm's rates and labour norms.",
    tiles: [
      { title: "Projects", text: "Schemes waiting to be priced; quotations and tenders.", href: "/projects" },
      { title: "Rate book", text: "The firm's rates and labour norms, in versions you can compare, export and import.", href: "/rates" },
    ],
  },
  workshop: {
    heading: "Workshop",
    lead: "What will be made, restored or revoiced, and the hours it takes.",
    tiles: [{ title: "Projects", text: "Pipes, chests and hours by department; the work list of each issued quotation.", href: "/projects" }],
  },
  client: {
    heading: "Your organ committee",
    lead: "The schemes your organ builder has shared with you, to compare and comment on.",
    tiles: [],
  },
};

export default async function HomePage() {
  const user = await requirePageUser();
  const home = homes[user.role];
  const projects = can(user.role, "projects:read") ? (await listProjectsForUser({ user })).slice(0, 6) : [];
  return (
    <div className="space-y-6" data-testid={`home-${user.role}`}>
      <div>
        <p className="text-xs font-semibold uppercase tracking-wide text-brass-dark">{roleLabels[user.role]}</p>
        <h1 className="text-3xl font-semibold">{home.heading}</h1>
        <p className="mt-1 text-ink-soft">{home.lead}</p>
      </div>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {home.tiles.map((t) =>
          t.href ? (
            <Link key={t.title} href={t.href} className="panel block p-4 hover:border-brass">
              <h2 className="text-lg font-semibold">{t.title}</h2>
              <p className="mt-1 text-sm text-ink-soft">{t.text}</p>
            </Link>
          ) : (
            <div key={t.title} className="panel p-4">
              <h2 className="text-lg font-semibold">{t.title}</h2>
              <p className="mt-1 text-sm text-ink-soft">{t.text}</p>
            </div>
          ),
        )}
      </div>
      <section aria-labelledby="recent-heading">
        <h2 id="recent-heading" className="mb-2 text-xl font-semibold">{user.role === "client" ? "Your projects" : "Recent projects"}</h2>
        {projects.length === 0 ? (
          <p className="text-sm text-ink-soft">
            {user.role === "client" ? "Nothing has been shared with you yet." : "No projects yet."}
          </p>
        ) : (
          <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {projects.map((p) => (
              <li key={p.id}>
                <Link href={`/projects/${p.id}`} className="panel block p-4 hover:border-brass" data-testid={`home-project-${p.name}`}>
                  <span className="block font-serif text-lg font-semibold">{p.name}</span>
                  <span className="block text-sm text-ink-soft">{p.clientName}</span>
                  <span className="mt-1 block text-xs text-tin">
                    {projectStatusLabels[p.status]} · {p.schemeCount} {p.schemeCount === 1 ? "scheme" : "schemes"}
                    {user.role === "client" ? " shared with you" : ""}
                  </span>
                </Link>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
