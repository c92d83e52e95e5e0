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
  /** Everything computed from the plan; a write that changes supply or demand invalidates this prefix. */
  plan: (gardenId: string) => ["gardens", gardenId, "balance"] as const,
  balance: (gardenId: string, from: string, months: number) =>
    ["gardens", gardenId, "balance", from, months] as const,
  whatIf: (gardenId: string, from: string, months: number, changes: unknown) =>
    ["gardens", gardenId, "balance", from, months, "what-if", changes] as const,
  beds: (gardenId: string) => ["gardens", gardenId, "beds"] as const,
  bed: (gardenId: string, bedId: string) => ["gardens", gardenId, "beds", bedId] as const,
  plantings: (gardenId: string) => ["gardens", gardenId, "plantings"] as const,
  crops: (gardenId: string) => ["gardens", gardenId, "crops"] as const,
  outbox: () => ["dev", "outbox"] as const,
};
