import { Redis, type RedisOptions } from "ioredis";
import { env } from "@/lib/env";

/**
 * A Redis connection for the job queue. Workers block on Redis and must retry forever
 * (`maxRetriesPerRequest: null`, as BullMQ requires); the web process fails fast instead, so
 * a request answers "try again" rather than hanging when Redis is down.
 */
export function redisConnection(kind: "worker" | "web", url = env().REDIS_URL): Redis {
  const options: RedisOptions =
    kind === "worker" ? { maxRetriesPerRequest: null } : { maxRetriesPerRequest: 1, connectTimeout: 3000, retryStrategy: (times) => Math.min(times * 200, 2000) };
  return new Redis(url, options);
}
