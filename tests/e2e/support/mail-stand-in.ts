// Stopping and starting the test run's mail stand-in (scripts/lib/mail-stand-in.mjs), for tests of what
// happens while the mail server is down: a control file in its outbox folder makes it stop listening.
import { rmSync, writeFileSync } from "node:fs";
import net from "node:net";
import path from "node:path";

const CONTROL = path.join(process.env.MAIL_OUTBOX_DIR ?? "", "stand-in-stopped");

/** Whether the mail stand-in accepts connections right now. */
function smtpListening(): Promise<boolean> {
  const url = new URL(process.env.SMTP_URL!);
  return new Promise((resolve) => {
    const socket = net.connect(Number(url.port), url.hostname);
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("error", () => resolve(false));
  });
}

async function untilSmtp(listening: boolean) {
  const end = Date.now() + 10_000;
  while ((await smtpListening()) !== listening) {
    if (Date.now() > end) throw new Error(`the mail stand-in did not ${listening ? "start" : "stop"}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Stops the stand-in and waits until it refuses connections. */
export async function stopMailStandIn() {
  writeFileSync(CONTROL, "");
  await untilSmtp(false);
}

/** Starts it again (it is never left stopped: call this in afterAll too) and waits until it listens. */
export async function startMailStandIn() {
  rmSync(CONTROL, { force: true });
  await untilSmtp(true);
}
