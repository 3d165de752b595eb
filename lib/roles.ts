/**
 * Roles and what each may do: the one map every server boundary checks (lib/server/guard.ts).
 * The UI may hide what a role cannot do, but never relies on hiding.
 */
export const roles = ["admin", "designer", "estimator", "workshop", "client"] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  admin: "Administrator",
  designer: "Tonal director",
  estimator: "Estimator",
  workshop: "Workshop",
  client: "Committee member",
};

export const permissions = [
  "users:manage",
  "firm:manage",
  "projects:create",
  "projects:read",
  "projects:edit",
  /** Where a project stands (enquiry, tender, contracted…): the estimator manages it without editing the rest. */
  "projects:status",
  "schemes:edit",
  "schemes:read",
  /** Earlier versions with their authors and notes: the firm's working history, not the committee's. */
  "revisions:read",
  "estimate:read",
  "money:read",
  "rates:manage",
  "quotes:issue",
  "notes:write",
  /** Survey files: see them (clients: only those shared with the committee), add and describe them, share them. */
  "files:read",
  "files:write",
  "files:share",
  /** The firm's own notes on a scheme, which never reach a client. */
  "notes:read",
  /** Invite committee members by e-mail, re-send or withdraw invitations, remove members of the committee. */
  "committee:manage",
  /** Comment on a shared scheme (optionally on one stop): the firm and the project's committee read them. */
  "comments:write",
  /** A committee member's own preferred scheme. */
  "preferences:record",
  /** Who on the committee prefers which scheme. */
  "preferences:read",
  /** The outbox: every message the app queued, with its text, links and attachments. */
  "mail:read",
] as const;
export type Permission = (typeof permissions)[number];

const grants: Record<Role, readonly Permission[]> = {
  // A preference is a committee member's own; the administrator manages, but does not sit on a committee.
  admin: permissions.filter((p) => p !== "preferences:record"),
  designer: [
    "projects:create", "projects:read", "projects:edit", "projects:status", "schemes:edit", "schemes:read", "revisions:read", "estimate:read", "money:read",
    "notes:write", "notes:read", "committee:manage", "comments:write", "preferences:read", "files:read", "files:write", "files:share",
  ],
  estimator: [
    "projects:read", "projects:status", "schemes:read", "revisions:read", "estimate:read", "money:read", "rates:manage", "quotes:issue",
    "notes:write", "notes:read", "committee:manage", "comments:write", "preferences:read", "files:read", "files:write", "files:share",
  ],
  // The workshop makes much of the survey on site: it adds photos, but sharing is for the people who deal with the committee.
  workshop: ["projects:read", "schemes:read", "revisions:read", "estimate:read", "notes:write", "notes:read", "preferences:read", "files:read", "files:write"],
  // Clients see only shared schemes and shared files of their own projects, and never rates, hours or margins.
  client: ["projects:read", "schemes:read", "files:read", "comments:write", "preferences:record"],
};

export function can(role: Role, permission: Permission): boolean {
  return grants[role].includes(permission);
}
