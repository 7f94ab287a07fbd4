import { connection, NextResponse } from "next/server";
import { pingDatabase } from "@/lib/health/queries";


// Public: load balancers probe it. It says whether the database answers, nothing more.
export async function GET() {
  // Asked at request time, never answered once at build.
  await connection();
  try {
    const { kind, latencyMs } = await pingDatabase();
    return NextResponse.json({ status: "ok", database: { state: "up", kind, latencyMs } });
  } catch (error) {
    console.error("health check: database unavailable", error);
    return NextResponse.json({ status: "degraded", database: { state: "down" } }, { status: 503 });
  }
}
