// Every React Query key in one place, so a mutation invalidates exactly what it touched.
export const queryKeys = {
  gardens: () => ["gardens"] as const,
  garden: (gardenId: string) => ["gardens", gardenId] as const,
  members: (gardenId: string) => ["gardens", gardenId, "members"] as const,
  invitations: (gardenId: string) => ["gardens", gardenId, "invitations"] as const,
  bins: (gardenId: string) => ["gardens", gardenId, "bins"] as const,
  binLog: (gardenId: string, binId: string, kind?: string) =>
    ["gardens", gardenId, "bins", binId, "log", kind ?? "all"] as const,
  lots: (gardenId: string) => ["gardens", gardenId, "lots"] as const,
  // The Balance reads stock and bins: every bin or stock write invalidates it.
  balance: (gardenId: string) => ["gardens", gardenId, "balance"] as const,
  outbox: () => ["dev", "outbox"] as const,
};
