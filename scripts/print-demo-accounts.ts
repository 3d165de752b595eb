// Prints the invented demo accounts for `npm run demo`.
import { demoAccounts } from "../db/demo-accounts";
import { roleLabels } from "../lib/roles";

for (const a of demoAccounts) console.log(`  ${roleLabels[a.role].padEnd(18)} ${a.email.padEnd(32)} ${a.password}`);
