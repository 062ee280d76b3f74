/**
 * Every migration, listed by hand in order (a glob fails inside `next start`: STACK.md §7).
 * To add one: create migrations/NNNN-what.ts exporting `up` and `down`, then add it here.
 */
import * as m0001 from "./0001-create-teams-and-users";
import * as m0002 from "./0002-create-tours";
import * as m0003 from "./0003-create-catalog-mail-audit";

export const migrations = [
  { name: "0001-create-teams-and-users", ...m0001 },
  { name: "0002-create-tours", ...m0002 },
  { name: "0003-create-catalog-mail-audit", ...m0003 },
];
