import { readFile } from "node:fs/promises";
import path from "node:path";
import { z } from "zod";
import { apiRoute } from "@/lib/auth/route";

const querySchema = z.object({ format: z.enum(["csv", "xlsx"]).default("xlsx") });

/** The equipment catalog import template (templates/equipment-catalog-template.*). */
export const GET = apiRoute({ permission: "read" }, async ({ request }) => {
  const { format } = querySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
  const data = await readFile(path.join(process.cwd(), "templates", `equipment-catalog-template.${format}`));
  return new Response(new Uint8Array(data), {
    headers: {
      "content-type": format === "csv" ? "text/csv; charset=utf-8" : "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
      "content-disposition": `attachment; filename="equipment-catalog-template.${format}"`,
    },
  });
});
