import { sql } from "drizzle-orm";
import { NextResponse } from "next/server";
import { getDb, getDbKind } from "@/db/client";

export const dynamic = "force-dynamic";

// Public: load balancers probe it. It says whether the database answers, nothing more.
export async function GET() {
  const started = performance.now();
  try {
    const db = await getDb();
    await db.execute(sql`select 1`);
    return NextResponse.json({
      status: "ok",
      database: { state: "up", kind: await getDbKind(), latencyMs: Math.round((performance.now() - started) * 10) / 10 },
    });
  } catch (error) {
    console.error("health check: database unavailable", error);
    return NextResponse.json({ status: "degraded", database: { state: "down" } }, { status: 503 });
  }
}
