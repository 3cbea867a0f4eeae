import type { RedisOptions } from "bullmq";
import { env } from "@/lib/env";

/**
 * Connection settings for the job queue's Redis, from REDIS_URL; BullMQ makes (and closes) its
 * own connections from them. Workers block on Redis and must retry forever
 * (`maxRetriesPerRequest: null`, as BullMQ requires); the web process fails fast instead, so a
 * request answers "try again" rather than hanging when Redis is down.
 */
export function redisConnection(kind: "worker" | "web", url = env().REDIS_URL): RedisOptions {
  return kind === "worker"
    ? { url, maxRetriesPerRequest: null }
    : {
        url,
        maxRetriesPerRequest: 1,
        connectTimeout: 3000,
        retryStrategy: (times: number) => Math.min(times * 200, 2000),
      };
}
