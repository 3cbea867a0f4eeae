// Platload's web server: Next.js behind Node's own HTTP server, for `npm start`, `npm run dev`, the
// demo and the end-to-end tests. Next hands route handlers no socket, and `next start` passes on
// any X-Forwarded-For a client sends; here each request first gets the client's address, read from
// the socket and, behind PLATLOAD_TRUSTED_PROXIES proxies, from the hops they added
// (lib/http/client-address.ts). The sign-in limits key on it.
//
//   tsx scripts/serve.ts [--dev] [-H 127.0.0.1] [-p 3710]
import { createServer } from "node:http";
import path from "node:path";
import { env } from "@/lib/env";
import { markClientAddressesStamped, stampClientAddress } from "@/lib/http/client-address";

const args = process.argv.slice(2);
const option = (name: string) => {
  const i = args.indexOf(name);
  return i >= 0 ? args[i + 1] : undefined;
};
const dev = args.includes("--dev");
const hostname = option("-H") ?? "127.0.0.1";
const port = Number(option("-p") ?? process.env.PORT ?? 3710);

async function main() {
  // Next reads NODE_ENV when it loads: set it first, then load Next.
  (process.env as Record<string, string>).NODE_ENV = dev ? "development" : "production";
  const trustedProxies = env().PLATLOAD_TRUSTED_PROXIES; // validates the whole environment at start
  const { default: next } = await import("next");
  const server = createServer();
  const app = next({ dev, dir: path.resolve(__dirname, ".."), hostname, port, httpServer: server });
  const handle = app.getRequestHandler();
  await app.prepare();
  markClientAddressesStamped();
  server.on("request", (request, response) => {
    stampClientAddress(request, trustedProxies);
    void handle(request, response);
  });
  server.listen(port, hostname, () => {
    console.log(
      `Platload ${dev ? "(development) " : ""}on http://${hostname}:${port}; ${trustedProxies} trusted prox${trustedProxies === 1 ? "y" : "ies"} in front`,
    );
  });
  for (const signal of ["SIGINT", "SIGTERM"] as const)
    process.on(signal, () => server.close(() => process.exit(0)));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
