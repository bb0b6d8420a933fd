// Failover between database servers: the host list parser and the chooser, with real sockets on loopback
// (one port with a listener, one with none) rather than a fake probe.
import net from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { acceptsConnections, hostChooser, parseHostList } from "@/lib/data/database-hosts";

describe("parseHostList", () => {
  it("reads host:port entries, with the MariaDB default port 3306 when left out", () => {
    expect(parseHostList(" db-a:3311, 127.0.0.1 ,[::1]:3313")).toEqual([
      { host: "db-a", port: 3311 },
      { host: "127.0.0.1", port: 3306 },
      { host: "::1", port: 3313 },
    ]);
  });

  it("names the entry that is not a host or host:port", () => {
    expect(() => parseHostList("db-a:3311,db b:1")).toThrow(/"db b:1"/);
    expect(() => parseHostList("db-a:70000")).toThrow(/"db-a:70000"/);
  });
});

describe("hostChooser over real sockets", () => {
  let live: net.Server;
  let livePort = 0;
  let deadPort = 0;
  beforeAll(async () => {
    live = net.createServer((s) => s.end());
    await new Promise<void>((r) => live.listen(0, "127.0.0.1", r));
    livePort = (live.address() as net.AddressInfo).port;
    // A port that was free a moment ago and has nothing listening now.
    const probe = net.createServer();
    await new Promise<void>((r) => probe.listen(0, "127.0.0.1", r));
    deadPort = (probe.address() as net.AddressInfo).port;
    await new Promise((r) => probe.close(r));
  });
  afterAll(() => new Promise((r) => live.close(r)));

  it("tells a listening port from a closed one", async () => {
    expect(await acceptsConnections({ host: "127.0.0.1", port: livePort })).toBe(true);
    expect(await acceptsConnections({ host: "127.0.0.1", port: deadPort })).toBe(false);
  });

  it("skips a server that does not answer and stays with the one that does", async () => {
    const dead = { host: "127.0.0.1", port: deadPort };
    const up = { host: "127.0.0.1", port: livePort };
    const choose = hostChooser([dead, up]);
    expect(await choose()).toEqual(up);
    expect(await choose()).toEqual(up);
  });

  it("goes back to the first server only when the one in use stops answering", async () => {
    const state = new Map([
      ["a", true],
      ["b", true],
    ]);
    const hosts = [
      { host: "a", port: 1 },
      { host: "b", port: 2 },
    ];
    const choose = hostChooser(hosts, async (h) => state.get(h.host) ?? false);
    expect((await choose()).host).toBe("a");
    state.set("a", false);
    expect((await choose()).host).toBe("b");
    state.set("a", true); // a is back, but b still answers: no flapping back
    expect((await choose()).host).toBe("b");
    state.set("b", false);
    expect((await choose()).host).toBe("a");
    state.set("a", false); // none answers: the last used, so the connect fails and the request gets a 503
    expect((await choose()).host).toBe("a");
  });
});
