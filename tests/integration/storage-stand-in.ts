// Typed access to the runner's S3 stand-in (scripts/lib/s3-stand-in.mjs) for tests that start their own.
import net from "node:net";
import path from "node:path";
import { pathToFileURL } from "node:url";

type StandIn = { env: Record<string, string>; stop: () => Promise<unknown> };
type StandInModule = { startS3StandIn: (o: { port: number; dir: string; bucket?: string }) => Promise<StandIn> };

export async function startS3StandIn(o: { port: number; dir: string; bucket?: string }): Promise<StandIn> {
  const url = pathToFileURL(path.resolve("scripts/lib/s3-stand-in.mjs")).href;
  const mod = (await import(url)) as StandInModule;
  return mod.startS3StandIn(o);
}

/** A loopback port nothing listens on at the moment. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}
