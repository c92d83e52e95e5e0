import type { Metadata } from "next";
import { searchParam, type SearchParams } from "@/lib/search-params";
import Link from "next/link";
import { BedForm } from "@/components/beds/bed-form";
import { BedList } from "@/components/beds/bed-list";
import {
  Button,
  buttonStyles,
  Card,
  CardBody,
  CardHeader,
  CardTitle,
  EmptyState,
  Input,
  Select,
} from "@/components/ui";
import { listBeds } from "@/db/queries/beds";
import { getGardenById } from "@/db/queries/gardens";
import { requirePageMember } from "@/lib/auth/page-session";
import { roleAtLeast } from "@/lib/auth/roles";
import { listBedsQuerySchema } from "@/lib/validation/bed";

export const metadata: Metadata = { title: "Beds" };

const PAGE = 24;

export default async function BedsPage({
  params,
  searchParams,
}: {
  params: Promise<{ gardenId: string }>;
  searchParams: Promise<SearchParams>;
}) {
  const { gardenId } = await params;
  const member = await requirePageMember(gardenId, "viewer");
  const raw = await searchParams;
  const one = (key: string) => searchParam(raw, key);
  // Filters live in the URL, so a filtered view can be linked; bad values fall back to none.
  const parsed = listBedsQuerySchema.safeParse({
    kind: one("kind"),
    q: one("q"),
    limit: PAGE,
    offset: Math.max(0, (Number(one("page") ?? 1) - 1) * PAGE) || 0,
  });
  const query = parsed.success ? parsed.data : listBedsQuerySchema.parse({ limit: PAGE });
  const [garden, { beds, total }] = await Promise.all([
    getGardenById({ gardenId }),
    listBeds({ gardenId, query }),
  ]);
  if (!garden) return null;
  const canEdit = roleAtLeast(member.role, "grower");
  const filtered = Boolean(query.kind || query.q);
  const page = Math.floor(query.offset / PAGE) + 1;
  const pageHref = (p: number) => {
    const sp = new URLSearchParams();
    if (query.kind) sp.set("kind", query.kind);
    if (query.q) sp.set("q", query.q);
    sp.set("page", String(p));
    return `?${sp}`;
  };

  return (
    <>
      <header className="flex flex-wrap items-end justify-between gap-3">
        <h1 className="text-3xl">Beds and containers</h1>
        <div className="flex flex-wrap gap-2">
          {canEdit ? (
            <Link
              href={`/g/${gardenId}/beds/import`}
              className={buttonStyles({ variant: "secondary", size: "sm" })}
            >
              Import from CSV
            </Link>
          ) : null}
          <Link
            href={`/g/${gardenId}/crops`}
            className={buttonStyles({ variant: "ghost", size: "sm" })}
          >
            Crops
          </Link>
          {total > 0 ? (
            <a
              href={`/api/gardens/${gardenId}/beds/export`}
              className={buttonStyles({ variant: "ghost", size: "sm" })}
            >
              Download as CSV
            </a>
          ) : null}
        </div>
      </header>
      {total === 0 && !filtered ? (
        <EmptyState
          title="No beds or containers yet"
          text={
            canEdit
              ? "Add a bed first (say a raised bed 8 × 4 ft) or a container (a 5-gallon pot). Then add its plants, like “6 tomato, 4 pepper”, and Castline works out what they need."
              : "When a grower adds beds and containers, they appear here."
          }
        />
      ) : (
        <section aria-labelledby="bed-list-title" className="flex flex-col gap-3">
          <h2 id="bed-list-title" className="sr-only">
            Your beds and containers
          </h2>
          <form method="get" className="flex flex-wrap items-end gap-3" aria-label="Filter beds">
            <label className="flex flex-col gap-1.5 font-semibold">
              Show
              <Select name="kind" defaultValue={query.kind ?? ""} className="w-44">
                <option value="">All</option>
                <option value="bed">Beds only</option>
                <option value="container">Containers only</option>
              </Select>
            </label>
            <label className="flex flex-col gap-1.5 font-semibold">
              Name contains
              <Input name="q" defaultValue={query.q ?? ""} className="w-44" />
            </label>
            <Button type="submit" variant="secondary">
              Filter
            </Button>
            {filtered ? (
              <Link href="?" className={buttonStyles({ variant: "ghost" })}>
                Clear
              </Link>
            ) : null}
          </form>
          {beds.length ? (
            <BedList gardenId={gardenId} beds={beds} unitSystem={garden.unitSystem} />
          ) : (
            <p className="text-soil-700">Nothing matches these filters.</p>
          )}
          {total > PAGE ? (
            <nav aria-label="Pages" className="flex items-center gap-3">
              {page > 1 ? (
                <Link
                  href={pageHref(page - 1)}
                  className={buttonStyles({ variant: "secondary", size: "sm" })}
                >
                  Previous
                </Link>
              ) : null}
              <span className="text-sm text-soil-700">
                Page {page} of {Math.ceil(total / PAGE)}
              </span>
              {page * PAGE < total ? (
                <Link
                  href={pageHref(page + 1)}
                  className={buttonStyles({ variant: "secondary", size: "sm" })}
                >
                  Next
                </Link>
              ) : null}
            </nav>
          ) : null}
        </section>
      )}
      {canEdit ? (
        <Card>
          <CardHeader>
            <CardTitle>Add a bed or container</CardTitle>
          </CardHeader>
          <CardBody>
            <BedForm gardenId={gardenId} unitSystem={garden.unitSystem} />
          </CardBody>
        </Card>
      ) : null}
    </>
  );
}
