import { NextResponse } from "next/server";
import { getDb } from "@/models";

export const dynamic = "force-dynamic";

/** Liveness and database reachability, for the test runner and load balancers. */
export async function GET() {
  try {
    await getDb().sequelize.query("SELECT 1");
    return NextResponse.json({ status: "ok", database: "reachable" });
  } catch {
    return NextResponse.json({ status: "degraded", database: "unreachable" }, { status: 503 });
  }
}
