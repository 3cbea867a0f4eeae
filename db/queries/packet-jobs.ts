import "server-only";
import { enqueueJob } from "@/lib/jobs/queue";
import { failPacket, requestPacket } from "./packets";

/**
 * Records a packet request and queues its job. When the queue does not answer, the packet is
 * marked failed (saying so) and the caller gets the 503.
 */
export async function queuePacket(
  args: Parameters<typeof requestPacket>[0],
): Promise<{ packetId: number; lotCount: number }> {
  const { jobId, ...queued } = await requestPacket(args);
  try {
    await enqueueJob("packet", { packetId: queued.packetId }, { jobId });
  } catch (error) {
    await failPacket(
      args.db,
      queued.packetId,
      "the job queue did not answer, so it was not made; ask for it again",
    );
    throw error;
  }
  return queued;
}
