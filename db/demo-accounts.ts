import type { Role } from "../lib/roles";

/** Invented people of the invented demo firm; the passwords are printed by `npm run demo` and in the README. */
export const demoFirm = {
  name: "Corvin Lathe Organ Builders (demo firm)",
  address: "Unit 4, Saltmarsh Yard\nWexmoor WX4 0AA (invented address)",
  email: "office@corvinlathe.example",
  phone: "+44 0000 000000 (invented)",
  website: "corvinlathe.example",
  registration: "An invented firm for Stopwright's demonstration; registered nowhere.",
};

export const demoAccounts: ReadonlyArray<{ email: string; name: string; role: Role; password: string }> = [
  { email: "admin@corvinlathe.example", name: "Marguerite Ashdown", role: "admin", password: "demo-admin-pass" },
  { email: "tonal@corvinlathe.example", name: "Tobias Quell", role: "designer", password: "demo-tonal-pass" },
  { email: "estimates@corvinlathe.example", name: "Ines Harrowby", role: "estimator", password: "demo-estimate-pass" },
  { email: "workshop@corvinlathe.example", name: "Declan Ferrow", role: "workshop", password: "demo-workshop-pass" },
  { email: "committee@staldric.example", name: "Hilda Orme", role: "client", password: "demo-committee-pass" },
];

/**
 * St Aldric's organ committee (all invented): Hilda Orme above, its secretary, with the rector and
 * the independent organ adviser. Only Hilda's password is printed; the others sign in the same way.
 */
export const demoCommittee: ReadonlyArray<{ email: string; name: string; password: string }> = [
  { email: "committee@staldric.example", name: "Hilda Orme", password: "demo-committee-pass" },
  { email: "rector@staldric.example", name: "Revd Piers Anworth", password: "demo-rector-pass" },
  { email: "adviser@staldric.example", name: "Dr Maud Kestle", password: "demo-adviser-pass" },
];
