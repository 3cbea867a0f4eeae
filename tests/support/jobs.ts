// Following the work the test run's job worker does, through the same routes the pages poll.
import * as importItemRoute from "@/app/api/imports/[importId]/route";
import * as packetStatusRoute from "@/app/api/packets/[packetId]/status/route";
import { callRoute } from "./requests";

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** The import as GET /api/imports/:id shows it once it has succeeded or failed (60 s at most). */
export async function waitForImport(
  cookie: string,
  importId: number,
): Promise<{
  state: string;
  createdCount: number;
  updatedCount: number;
  errors: { row: number; column: string; reason: string }[];
  errorCount: number;
  fileKey: string | null;
}> {
  for (let i = 0; i < 600; i++) {
    const res = await callRoute(importItemRoute.GET, {
      path: "/x",
      params: { importId: String(importId) },
      cookie,
    });
    if (res.status !== 200)
      throw new Error(`GET /api/imports/${importId} answered ${res.status}: ${res.text}`);
    if (["succeeded", "failed"].includes(res.json.import.state)) return res.json.import;
    await pause(100);
  }
  throw new Error(`import ${importId} did not finish within 60 s`);
}

/** The packet as GET /api/packets/:id/status shows it once it is ready or failed (90 s at most). */
export async function waitForPacket(
  cookie: string,
  packetId: number,
): Promise<{
  state: string;
  fileName: string;
  lotCount: number;
  sizeBytes: number;
  sentTo: string[] | null;
  error: string | null;
}> {
  for (let i = 0; i < 900; i++) {
    const res = await callRoute(packetStatusRoute.GET, {
      path: "/x",
      params: { packetId: String(packetId) },
      cookie,
    });
    if (res.status !== 200)
      throw new Error(`GET /api/packets/${packetId}/status answered ${res.status}: ${res.text}`);
    if (["ready", "failed"].includes(res.json.packet.state)) return res.json.packet;
    await pause(100);
  }
  throw new Error(`packet ${packetId} was not made within 90 s`);
}
