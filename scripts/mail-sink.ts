// A fake SMTP server for development and tests: it accepts every message on
// loopback, keeps it as JSON in MAIL_SINK_DIR, and serves a small read-only
// mailbox page (and /api/messages as JSON) so a person or a test can read it.
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import http from "node:http";
import fs from "node:fs";
import path from "node:path";

const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const uiPort = Number(process.env.MAIL_UI_PORT ?? 1081);
const dir = process.env.MAIL_SINK_DIR ?? path.resolve(".data/dev/mail");
fs.mkdirSync(dir, { recursive: true });

interface Stored { id: string; at: string; from: string; to: string[]; subject: string; text: string; html: string }

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        const id = `${Date.now()}-${Math.random().toString(36).slice(2, 8)}`;
        const msg: Stored = {
          id,
          at: new Date().toISOString(),
          from: mail.from?.text ?? "",
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: mail.subject ?? "",
          text: mail.text ?? "",
          html: typeof mail.html === "string" ? mail.html : "",
        };
        fs.writeFileSync(path.join(dir, `${id}.json`), JSON.stringify(msg));
        callback();
      })
      .catch((e: Error) => callback(e));
  },
});
smtp.listen(smtpPort, "127.0.0.1");

function readAll(): Stored[] {
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .map((f) => JSON.parse(fs.readFileSync(path.join(dir, f), "utf8")) as Stored)
    .sort((a, b) => b.at.localeCompare(a.at));
}

const esc = (s: string) => s.replace(/[&<>"]/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" })[c]!);

http
  .createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://x");
    if (url.pathname === "/api/messages") {
      const to = url.searchParams.get("to");
      const list = readAll().filter((m) => !to || m.to.some((a) => a.toLowerCase() === to.toLowerCase()));
      res.writeHead(200, { "content-type": "application/json" });
      res.end(JSON.stringify(list));
      return;
    }
    if (url.pathname === "/api/clear" && req.method === "POST") {
      for (const f of fs.readdirSync(dir)) fs.rmSync(path.join(dir, f));
      res.writeHead(204).end();
      return;
    }
    const rows = readAll()
      .map((m) => `<article><h2>${esc(m.subject)}</h2><p><b>To:</b> ${esc(m.to.join(", "))} · <b>From:</b> ${esc(m.from)} · ${esc(m.at)}</p><pre>${esc(m.text)}</pre></article>`)
      .join("<hr>");
    res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
    res.end(`<!doctype html><title>Bellows test mailbox</title><body style="font-family:sans-serif;max-width:60rem;margin:2rem auto"><h1>Bellows test mailbox</h1><p>Messages sent by this machine's Bellows. Nothing here left the machine.</p>${rows || "<p>No messages yet.</p>"}</body>`);
  })
  .listen(uiPort, "127.0.0.1");

const stop = () => { smtp.close(() => process.exit(0)); setTimeout(() => process.exit(0), 1000); };
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
console.log(`fake SMTP on 127.0.0.1:${smtpPort}, mailbox on http://127.0.0.1:${uiPort}`);
