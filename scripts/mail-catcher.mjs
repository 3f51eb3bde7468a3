// A local SMTP catcher for development and tests: accepts mail on loopback, keeps it in memory and
// serves it as JSON over HTTP (GET /messages, GET /messages?to=addr, DELETE /messages).
// The real SMTP host is configuration (SMTP_HOST / SMTP_PORT); this never relays anything.
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import http from "node:http";

function argument(name, fallback) {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 && process.argv[i + 1] ? Number(process.argv[i + 1]) : fallback;
}

const smtpPort = argument("smtp", 2525);
const httpPort = argument("http", 2580);
const messages = [];
let nextId = 1;

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  size: 10 * 1024 * 1024,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        messages.push({
          id: nextId++,
          receivedAt: new Date().toISOString(),
          from: mail.from?.text ?? "",
          to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
          subject: mail.subject ?? "",
          text: mail.text ?? "",
          html: typeof mail.html === "string" ? mail.html : "",
        });
        if (messages.length > 1000) messages.shift();
        callback();
      })
      .catch((err) => callback(err));
  },
});
smtp.on("error", (err) => console.error("smtp error", err.message));
smtp.listen(smtpPort, "127.0.0.1", () => console.log(`mail catcher SMTP on 127.0.0.1:${smtpPort}`));

const api = http.createServer((req, res) => {
  const url = new URL(req.url ?? "/", `http://127.0.0.1:${httpPort}`);
  if (url.pathname !== "/messages") {
    res.writeHead(404).end();
    return;
  }
  if (req.method === "DELETE") {
    messages.length = 0;
    res.writeHead(204).end();
    return;
  }
  const to = url.searchParams.get("to")?.toLowerCase();
  const list = to ? messages.filter((m) => m.to.includes(to)) : messages;
  res.writeHead(200, { "content-type": "application/json" }).end(JSON.stringify(list));
});
api.listen(httpPort, "127.0.0.1", () => console.log(`mail catcher HTTP on 127.0.0.1:${httpPort}`));

for (const signal of ["SIGINT", "SIGTERM"]) {
  process.on(signal, () => {
    smtp.close(() => undefined);
    api.close(() => process.exit(0));
    setTimeout(() => process.exit(0), 500).unref();
  });
}
