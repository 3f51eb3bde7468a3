// Printed by `npm start` so a person can sign in straight away.
import { DEMO_ACCOUNTS, DEMO_WORKSPACE } from "../lib/demo-accounts";

const url = process.env.NEXTAUTH_URL ?? "http://127.0.0.1:3000";
console.log(`\n  Caryatid is starting at ${url}`);
console.log(`  Demo workspace: ${DEMO_WORKSPACE.name}`);
for (const a of DEMO_ACCOUNTS) console.log(`    ${a.role.padEnd(9)} ${a.email.padEnd(34)} ${a.password}`);
console.log(`  Captured mail: ${process.env.MAIL_CATCHER_URL ?? "http://127.0.0.1:2580"}/messages\n`);
