/**
 * A minimal reader of CCSDS OEM files in KVN form, written for the tests only (independent of
 * lib/files/oem.ts): header keywords, META_START … META_STOP blocks and the data lines after
 * each, "epoch x y z x_dot y_dot z_dot". Layout from the CCSDS 502.0-B standard, from memory.
 */
export interface TestOem {
  header: Record<string, string>;
  segments: { meta: Record<string, string>; states: { t: number; r: [number, number, number]; v: [number, number, number] }[] }[];
}

const J2000_MS = Date.UTC(2000, 0, 1, 12);

function tdbSeconds(s: string): number {
  const m = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2}):(\d{2}(?:\.\d+)?)$/.exec(s);
  if (!m) throw new Error(`bad epoch ${s}`);
  const sec = Number(m[6]);
  const whole = Math.floor(sec);
  return (Date.UTC(+m[1]!, +m[2]! - 1, +m[3]!, +m[4]!, +m[5]!, whole) - J2000_MS) / 1000 + (sec - whole);
}

export function parseOemForTest(text: string): TestOem {
  const lines = text.split(/\r?\n/);
  const header: Record<string, string> = {};
  const segments: TestOem["segments"] = [];
  let mode: "header" | "meta" | "data" = "header";
  for (const raw of lines) {
    const line = raw.trim();
    if (!line || line.startsWith("COMMENT")) continue;
    if (line === "META_START") {
      mode = "meta";
      segments.push({ meta: {}, states: [] });
      continue;
    }
    if (line === "META_STOP") {
      mode = "data";
      continue;
    }
    const kv = /^([A-Z_]+)\s*=\s*(.*)$/.exec(line);
    if (mode === "header") {
      if (!kv) throw new Error(`header line without keyword: ${line}`);
      header[kv[1]!] = kv[2]!.trim();
    } else if (mode === "meta") {
      if (!kv) throw new Error(`metadata line without keyword: ${line}`);
      segments.at(-1)!.meta[kv[1]!] = kv[2]!.trim();
    } else {
      const f = line.split(/\s+/);
      if (f.length !== 7) throw new Error(`data line needs 7 fields: ${line}`);
      const n = f.slice(1).map(Number);
      if (!n.every(Number.isFinite)) throw new Error(`non-numeric data: ${line}`);
      segments.at(-1)!.states.push({ t: tdbSeconds(f[0]!), r: [n[0]!, n[1]!, n[2]!], v: [n[3]!, n[4]!, n[5]!] });
    }
  }
  return { header, segments };
}
