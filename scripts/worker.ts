// The job worker (`npm run worker`): runs imports, permit packets, e-mail and the sweep from the
// queue in Redis. Start as many as you like, on one machine or several (same DATABASE_URL,
// REDIS_URL, S3 and SMTP settings as the app); each job runs on one of them at a time.
// Runs under tsx with --conditions=react-server so modules marked "server-only" load.
import { getDb } from "@/db";
import { runImportJob } from "@/db/queries/import-jobs";
import { markImportStopped } from "@/db/queries/imports";
import { failPacket, runPacketJob } from "@/db/queries/packets";
import { sweep } from "@/db/queries/sweep";
import { env } from "@/lib/env";
import { createJobQueue } from "@/lib/jobs/queue";
import { startJobWorker } from "@/lib/jobs/worker";
import { sendMail } from "@/lib/mail/send";

const SWEEP_EVERY_MS = 5 * 60_000;

async function main() {
  const settings = env();
  const db = getDb();
  const queue = createJobQueue({ kind: "worker" });
  // Every worker declares the same schedule; Redis keeps one.
  await queue.upsertJobScheduler("sweep", { every: SWEEP_EVERY_MS }, { name: "sweep", data: {} });

  const worker = startJobWorker({
    handlers: {
      import: ({ importId }) => runImportJob({ db, importId }),
      packet: ({ packetId }) => runPacketJob({ db, packetId }),
      mail: (message) => sendMail(message),
      sweep: () => sweep({ db, queue }),
    },
    onFinalFailure: async (name, payload, error) => {
      if (name === "import")
        await markImportStopped(db, (payload as { importId: number }).importId, error.message);
      if (name === "packet")
        await failPacket(
          db,
          (payload as { packetId: number }).packetId,
          `it could not be made: ${error.message}`,
        );
    },
  });
  worker.on("completed", (job) => console.log(`job ${job.id} (${job.name}) done`));
  await worker.waitUntilReady();
  console.log(
    `platload worker ${process.pid} on queue prefix "${settings.PLATLOAD_QUEUE_PREFIX}", ${settings.PLATLOAD_WORKER_CONCURRENCY} at a time`,
  );

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`worker ${process.pid}: ${signal}, finishing the jobs in hand`);
    // close() waits for running jobs; a job cut short by a hard kill goes back to the queue anyway.
    await worker.close();
    await queue.close();
    process.exit(0);
  };
  process.on("SIGTERM", () => void stop("SIGTERM"));
  process.on("SIGINT", () => void stop("SIGINT"));
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
