/**
 * @-mentions in comments. The rule (also shown under the comment box):
 *
 *   `@` followed by a team member's full name (`@Priya Raman`), their first name when no other
 *   active member shares it (`@Priya`), or the local part of their e-mail address
 *   (`@analyst` for analyst@team.example). Case does not matter. The `@` must start a word
 *   (so `someone@example.org` is not a mention) and the name must end at a non-letter, non-digit.
 *   When several candidates match at one `@`, the longest wins.
 *
 * Pure: takes the members, returns the ids of those mentioned (each once, in order of first mention).
 */
export interface Mentionable {
  id: number;
  name: string;
  email: string;
}

const WORD = /[\p{L}\p{N}_]/u;

export function mentionCandidates(members: Mentionable[]): { text: string; id: number }[] {
  const firstNames = new Map<string, number[]>();
  for (const m of members) {
    const first = m.name.trim().split(/\s+/)[0]?.toLowerCase();
    if (first) firstNames.set(first, [...(firstNames.get(first) ?? []), m.id]);
  }
  const out: { text: string; id: number }[] = [];
  for (const m of members) {
    const full = m.name.trim().replace(/\s+/g, " ").toLowerCase();
    const local = m.email.split("@")[0]!.toLowerCase();
    const first = full.split(" ")[0]!;
    const texts = new Set([full, local]);
    if (firstNames.get(first)?.length === 1) texts.add(first);
    for (const text of texts) if (text) out.push({ text, id: m.id });
  }
  // Longest first, so "@Priya Raman" beats "@Priya".
  return out.sort((a, b) => b.text.length - a.text.length);
}

export function findMentions(body: string, members: Mentionable[]): number[] {
  const candidates = mentionCandidates(members);
  const lower = body.toLowerCase().replace(/\s+/g, " ");
  const found: number[] = [];
  for (let i = lower.indexOf("@"); i !== -1; i = lower.indexOf("@", i + 1)) {
    if (i > 0 && WORD.test(lower[i - 1]!)) continue; // part of an e-mail address
    const rest = lower.slice(i + 1);
    const hit = candidates.find((c) => rest.startsWith(c.text) && !WORD.test(rest.charAt(c.text.length)));
    if (hit && !found.includes(hit.id)) found.push(hit.id);
  }
  return found;
}
