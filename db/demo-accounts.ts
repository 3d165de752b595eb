import type { Role } from "../lib/roles";

/** Invented people of the invented demo firm; the passwords are printed by `npm run demo` and in the README. */
export const demoFirm = {
  name: "Corvin Lathe Organ Builders (demo firm)",
  address: "Unit 4, Saltmarsh Yard, Wexmoor (invented address)",
  email: "office@corvinlathe.example",
  phone: "+44 0000 000000 (invented)",
};

export const demoAccounts: ReadonlyArray<{ email: string; name: string; role: Role; password: string }> = [
  { email: "admin@corvinlathe.example", name: "Marguerite Ashdown", role: "admin", password: "demo-admin-pass" },
  { email: "tonal@corvinlathe.example", name: "Tobias Quell", role: "designer", password: "demo-tonal-pass" },
  { email: "estimates@corvinlathe.example", name: "Ines Harrowby", role: "estimator", password: "demo-estimate-pass" },
  { email: "workshop@corvinlathe.example", name: "Declan Ferrow", role: "workshop", password: "demo-workshop-pass" },
  { email: "committee@staldric.example", name: "Hilda Orme", role: "client", password: "demo-committee-pass" },
];
