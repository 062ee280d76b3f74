export type ShellRole = "lead" | "designer" | "analyst" | "viewer";

/** What the shell needs to know about the signed-in user (a subset of lib/auth's CurrentUser). */
export interface ShellUser {
  id: number;
  name: string;
  email: string;
  role: ShellRole;
  teamName: string;
}
