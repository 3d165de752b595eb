/**
 * The one query-key factory: every cached read of the browser is named here, so a mutation can say
 * exactly what it makes stale. Hierarchical: invalidating `keys.projects.all` refetches every project read.
 */
export const keys = {
  projects: {
    all: ["projects"] as const,
    list: (archived: boolean) => ["projects", "list", { archived }] as const,
    detail: (projectId: string) => ["projects", "detail", projectId] as const,
    invitations: (projectId: string) => ["projects", "detail", projectId, "invitations"] as const,
    preferences: (projectId: string) => ["projects", "detail", projectId, "preferences"] as const,
    ownPreference: (projectId: string) => ["projects", "detail", projectId, "own-preference"] as const,
    comparison: (projectId: string, schemeIds: readonly string[]) => ["projects", "detail", projectId, "comparison", schemeIds.join(",")] as const,
    changeCosts: (projectId: string, schemeIds: readonly string[]) => ["projects", "detail", projectId, "change-costs", schemeIds.join(",")] as const,
  },
  schemes: {
    all: ["schemes"] as const,
    detail: (schemeId: string) => ["schemes", schemeId] as const,
    revisions: (schemeId: string) => ["schemes", schemeId, "revisions"] as const,
    comments: (schemeId: string) => ["schemes", schemeId, "comments"] as const,
    notes: (schemeId: string) => ["schemes", schemeId, "notes"] as const,
  },
  files: {
    /** Every list of a project's files starts with this, so one invalidation refreshes the gallery and every stop's view. */
    project: (projectId: string) => ["files", projectId] as const,
    list: (projectId: string, filter: { schemeId?: string; stopId?: string } = {}) => ["files", projectId, filter] as const,
  },
  mail: { outbox: ["mail", "outbox"] as const },
  users: { list: ["users", "list"] as const },
} as const;
