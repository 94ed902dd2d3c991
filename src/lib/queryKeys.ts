/**
 * The one table of TanStack Query keys. Keys nest (["teams", id, "members"] sits under ["teams", id]),
 * so a mutation can invalidate a whole branch with the prefix.
 */
export const queryKeys = {
  config: () => ["config"] as const,
  me: () => ["me"] as const,
  teams: () => ["teams"] as const,
  team: (teamId: string) => ["teams", teamId] as const,
  members: (teamId: string) => ["teams", teamId, "members"] as const,
  diagrams: (teamId: string) => ["teams", teamId, "diagrams"] as const,
  diagramList: (teamId: string, archived: boolean) => ["teams", teamId, "diagrams", { archived }] as const,
  diagram: (id: string) => ["diagrams", id] as const,
  versions: (id: string) => ["diagrams", id, "versions"] as const,
  newestVersion: (id: string) => ["diagrams", id, "versions", "newest"] as const,
  version: (id: string, n: number) => ["diagrams", id, "versions", n] as const,
  comments: (id: string, n: number) => ["diagrams", id, "versions", n, "comments"] as const,
  invitation: (token: string) => ["invitations", token] as const,
  shareLinks: (diagramId: string) => ["diagrams", diagramId, "share-links"] as const,
  teamShareLinks: (teamId: string) => ["teams", teamId, "share-links"] as const,
  audit: (teamId: string, filters: object) => ["teams", teamId, "audit", filters] as const,
  shared: (token: string) => ["shared", token] as const,
};
