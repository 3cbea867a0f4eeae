import { after } from "next/server";

/**
 * Runs work after the response is sent (Next's after()), so a long import goes on when the user
 * leaves the page; its progress is kept in the database. Outside a request (tests, scripts) the
 * work simply starts now.
 */
export function runAfterResponse(task: () => Promise<unknown>): void {
  const guarded = () => task().catch((error: unknown) => console.error("background task failed:", error));
  try {
    after(guarded);
  } catch {
    void guarded();
  }
}
