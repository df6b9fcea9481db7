// GET one diagnose run (progress of a re-run) for the signed-in person's organization.
import { NextResponse } from "next/server";
import { getActor } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { errorResponse } from "@/lib/http";
import { getDiagnoseRun } from "@/lib/services/diagnose/get-diagnose-run";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  try {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Please sign in");
    const { id } = await ctx.params;
    return NextResponse.json(await getDiagnoseRun(actor, Number(id)));
  } catch (e) {
    return errorResponse(e, "diagnose-runs.get");
  }
}
