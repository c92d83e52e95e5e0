import { z } from "zod";
import { getGardenBalance } from "@/db/queries/garden-plan";
import { balanceCsv } from "@/lib/balance/csv";
import { requireRole } from "@/lib/auth/require-role";
import { parseParams, parseWith, route, refuseOtherMethods } from "@/lib/http";
import { balanceQuerySchema, queryObject } from "@/lib/validation/balance";

export const dynamic = "force-dynamic";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

// The garden's Balance (lib/balance/types.ts BalanceBody), or its month table as CSV.
export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const query = parseWith(balanceQuerySchema, queryObject(request.url));
  const balance = await getGardenBalance({ gardenId, from: query.from, months: query.months });
  const headers = { "Cache-Control": "private, no-store" };
  if (query.format === "csv") {
    const { from, months } = balance.body.range;
    return new Response(balanceCsv(balance.body), {
      headers: {
        ...headers,
        "Content-Type": "text/csv; charset=utf-8",
        "Content-Disposition": `attachment; filename="balance-${from}-${months}-months.csv"`,
      },
    });
  }
  return new Response(balance.json, {
    headers: { ...headers, "Content-Type": "application/json" },
  });
});

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods({ GET });
