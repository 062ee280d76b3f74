"use client";

import { useRef, useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { ApiError } from "@/lib/client/fetcher";
import { BODY_CSV_COLUMNS, BODY_CSV_MAX_BYTES, BODY_CSV_MAX_ROWS } from "@/lib/files/bodies-csv";

const TEMPLATE = `${BODY_CSV_COLUMNS.join(",")}\nExample rock (invented),2031-01-01T00:00:00Z,2.2,0.14,5.1,73.5,141.2,28.0,0.6,5.5,30\n`;

export interface BodiesUploadProps {
  onImported: (count: number) => void;
}

interface RowError {
  line: number;
  reasons: string[];
}

/** Upload a CSV of small bodies: all rows or none; every bad row is listed by line number. */
export function BodiesUpload({ onImported }: BodiesUploadProps) {
  const input = useRef<HTMLInputElement>(null);
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<{ message: string; rows: RowError[] } | null>(null);
  const [done, setDone] = useState<string | null>(null);

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    setError(null);
    setDone(null);
    const file = input.current?.files?.[0];
    if (!file) {
      setError({ message: "Choose a .csv file first.", rows: [] });
      return;
    }
    if (file.size > BODY_CSV_MAX_BYTES) {
      setError({ message: `The file is larger than ${BODY_CSV_MAX_BYTES / 1024} kB; split it or trim it.`, rows: [] });
      return;
    }
    const fd = new FormData();
    fd.append("file", file);
    setPending(true);
    try {
      const res = await fetch("/api/bodies/import", { method: "POST", body: fd, headers: { accept: "application/json" } });
      const body = (await res.json().catch(() => ({}))) as Record<string, unknown>;
      if (!res.ok) throw new ApiError(res.status, String(body.error ?? "http_error"), String(body.message ?? `Upload failed (${res.status}).`), body);
      const total = Number(body.total ?? 0);
      setDone(`Imported ${total} bod${total === 1 ? "y" : "ies"} from ${file.name}.`);
      if (input.current) input.current.value = "";
      onImported(total);
    } catch (ex) {
      if (ex instanceof ApiError) setError({ message: ex.message, rows: (ex.body.rows as RowError[] | undefined) ?? [] });
      else setError({ message: "The server could not be reached; nothing was imported.", rows: [] });
    } finally {
      setPending(false);
    }
  };

  return (
    <form onSubmit={submit} aria-label="Upload bodies CSV" className="space-y-3">
      <p className="text-sm text-muted">
        Header: <code className="font-mono text-xs text-ink">{BODY_CSV_COLUMNS.join(",")}</code> (<code className="font-mono text-xs">a_km</code> may
        replace <code className="font-mono text-xs">a_au</code>). Osculating heliocentric elements, mean ecliptic and equinox of J2000; angles in degrees;
        the mean anomaly is converted to true anomaly. Up to {BODY_CSV_MAX_ROWS} rows and {BODY_CSV_MAX_BYTES / 1024} kB; one bad row rejects the whole file.{" "}
        <a className="text-accent underline-offset-2 hover:underline" download="gybe-bodies-template.csv" href={`data:text/csv;charset=utf-8,${encodeURIComponent(TEMPLATE)}`}>
          Download a template
        </a>
      </p>
      <div className="flex flex-wrap items-center gap-3">
        <label className="text-sm text-ink">
          <span className="sr-only">Bodies CSV file</span>
          <input
            ref={input}
            type="file"
            name="file"
            accept=".csv,text/csv"
            aria-label="Bodies CSV file"
            className="block text-sm text-muted file:mr-3 file:h-8 file:rounded-md file:border file:border-line-strong file:bg-raised file:px-3 file:text-sm file:text-ink hover:file:border-muted"
          />
        </label>
        <Button type="submit" variant="primary" size="sm" pending={pending}>Import file</Button>
      </div>
      {done ? <p role="status" className="rounded-md border border-ok/40 bg-ok-soft px-3 py-2 text-sm text-ok">{done}</p> : null}
      {error ? (
        <div role="alert" className="space-y-2 rounded-md border border-bad/40 bg-bad-soft px-3 py-2 text-sm text-bad">
          <p className="font-medium">{error.rows.length ? `Nothing was imported: ${error.rows.length} bad row${error.rows.length === 1 ? "" : "s"}.` : error.message}</p>
          {error.rows.length ? (
            <ul className="max-h-64 space-y-1 overflow-y-auto text-xs" aria-label="Bad rows">
              {error.rows.map((r) => (
                <li key={r.line} data-line={r.line}>
                  <span className="font-mono font-semibold">Line {r.line}:</span> {r.reasons.join("; ")}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
    </form>
  );
}
