"use client";

import { useState, type FormEvent } from "react";
import useSWR from "swr";
import { ApiError, fetcher, sendJson } from "@/lib/client/fetcher";
import type { CommentItem } from "@/lib/db/queries/comments";
import { Button } from "@/components/ui/button";
import { SelectField, TextareaField } from "@/components/ui/field";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { stamp } from "@/lib/format";
import { InlineAlert } from "@/components/review/inline-alert";
import { useMounted } from "@/components/review/use-mounted";

export interface CommentNode {
  /** The stable node id of the tour. */
  id: string;
  /** What to show, e.g. "2 · Venus". */
  label: string;
}

export interface CommentsPanelProps {
  tourId: number;
  nodes: CommentNode[];
  /** The role may comment (lead, designer, analyst); the server checks again. */
  canComment: boolean;
  /** Pre-select a node in the "Pin to" field (e.g. the Workbench's selected flyby). */
  defaultNodeId?: string | null;
  className?: string;
}

type CommentList = { items: CommentItem[]; total: number };

export const MENTION_RULE =
  "Mention someone with @ and their full name (@Priya Raman), their first name when it is unique in the team (@Priya), or the part of their e-mail before the @ — they get an e-mail.";

const key = (tourId: number) => `/api/tours/${tourId}/comments`;

function CommentRow({ c, nodeLabel, onDelete, deleting }: { c: CommentItem; nodeLabel?: string; onDelete?: () => void; deleting?: boolean }) {
  return (
    <li id={`comment-${c.id}`} data-testid="comment" className="rounded-md border border-line bg-raised/40 px-3 py-2.5 target:border-accent">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="text-sm font-medium text-ink">{c.authorName ?? "Former member"}</span>
        <span className="flex items-center gap-2 text-xs text-muted">
          {c.nodeId ? (
            <span className="rounded-full border border-line-strong px-2 py-0.5 text-[11px]" title={`Pinned to node ${c.nodeId}`}>
              ◆ {nodeLabel ?? c.nodeId}
            </span>
          ) : null}
          <time dateTime={c.createdAt}>{stamp(c.createdAt)}</time>
          {onDelete ? (
            <Button size="sm" variant="ghost" className="h-6 px-2 text-xs" pending={deleting} onClick={onDelete} aria-label={`Delete comment by ${c.authorName ?? "former member"}`}>
              Delete
            </Button>
          ) : null}
        </span>
      </div>
      <p className="mt-1 text-sm whitespace-pre-wrap text-ink/90">{c.body}</p>
    </li>
  );
}

/**
 * Discussion: the tour's comments (oldest first), filterable by node, and a form to add one,
 * optionally pinned to a node. Self-contained: reads and writes /api/tours/[id]/comments.
 */
export function CommentsPanel({ tourId, nodes, canComment, defaultNodeId = null, className }: CommentsPanelProps) {
  const { data, error, isLoading, mutate } = useSWR<CommentList>(key(tourId), fetcher);
  const ready = useMounted();
  const [filter, setFilter] = useState<string>("all");
  const [body, setBody] = useState("");
  const [nodeId, setNodeId] = useState<string>(defaultNodeId ?? "");
  const [pending, setPending] = useState(false);
  const [fieldError, setFieldError] = useState<{ body?: string; nodeId?: string }>({});
  const [message, setMessage] = useState<{ tone: "bad" | "ok"; text: string } | null>(null);
  const [deleting, setDeleting] = useState<number | null>(null);
  const labels = new Map(nodes.map((n) => [n.id, n.label]));

  const items = (data?.items ?? []).filter((c) => (filter === "all" ? true : filter === "tour" ? c.nodeId === null : c.nodeId === filter));

  async function submit(e: FormEvent) {
    e.preventDefault();
    setMessage(null);
    if (!body.trim()) {
      setFieldError({ body: "Write something first." });
      return;
    }
    setFieldError({});
    setPending(true);
    try {
      const r = await sendJson<{ comment: CommentItem; mentioned: { name: string }[] }>(key(tourId), "POST", { body, nodeId: nodeId || undefined });
      setBody("");
      setMessage({ tone: "ok", text: r.mentioned.length ? `Posted. E-mailed ${r.mentioned.map((m) => m.name).join(", ")}.` : "Posted." });
      await mutate();
    } catch (err) {
      if (err instanceof ApiError && err.status === 400 && err.issues.length) {
        const next: { body?: string; nodeId?: string } = {};
        for (const i of err.issues) if (i.path === "body" || i.path === "nodeId") next[i.path] ??= i.message;
        setFieldError(next);
        if (!next.body && !next.nodeId) setMessage({ tone: "bad", text: err.message });
      } else setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "Could not reach the server. Try again." });
    } finally {
      setPending(false);
    }
  }

  async function remove(id: number) {
    setDeleting(id);
    setMessage(null);
    try {
      await sendJson(`${key(tourId)}/${id}`, "DELETE");
      await mutate();
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "Could not delete the comment." });
    } finally {
      setDeleting(null);
    }
  }

  return (
    <Card className={className} data-testid="comments-panel" data-ready={ready || undefined}>
      <CardHeader
        title="Discussion"
        description={data ? `${data.total} comment${data.total === 1 ? "" : "s"}` : "Comments on the tour and its nodes"}
        actions={
          nodes.length > 0 ? (
            <label className="flex items-center gap-2 text-xs text-muted">
              Show
              <select value={filter} onChange={(e) => setFilter(e.target.value)} className="h-8 rounded-md border border-line-strong bg-field px-2 text-sm text-ink">
                <option value="all">All comments</option>
                <option value="tour">Whole tour only</option>
                {nodes.map((n) => <option key={n.id} value={n.id}>{n.label}</option>)}
              </select>
            </label>
          ) : null
        }
      />
      <CardBody className="space-y-4">
        {error ? (
          <InlineAlert>{error instanceof ApiError ? error.message : "Could not load the comments."}</InlineAlert>
        ) : isLoading || !data ? (
          <div className="flex items-center gap-2 text-sm text-muted"><Spinner size={14} /> Loading comments…</div>
        ) : items.length === 0 ? (
          <p className="text-sm text-faint">{data.total === 0 ? "No comments yet." : "No comments match this filter."}</p>
        ) : (
          <ul className="space-y-2">
            {items.map((c) => (
              <CommentRow key={c.id} c={c} nodeLabel={c.nodeId ? labels.get(c.nodeId) : undefined} deleting={deleting === c.id} onDelete={c.canDelete ? () => remove(c.id) : undefined} />
            ))}
          </ul>
        )}

        {message ? <InlineAlert tone={message.tone}>{message.text}</InlineAlert> : null}

        {canComment ? (
          <form onSubmit={submit} className="space-y-3 border-t border-line pt-4" noValidate>
            <TextareaField
              label="Comment"
              name="comment"
              rows={3}
              maxLength={4000}
              value={body}
              onChange={(e) => setBody(e.target.value)}
              error={fieldError.body}
              hint={MENTION_RULE}
            />
            <div className="flex flex-wrap items-end justify-between gap-3">
              {nodes.length > 0 ? (
                <SelectField label="Pin to node" name="nodeId" value={nodeId} onChange={(e) => setNodeId(e.target.value)} error={fieldError.nodeId} className="min-w-48">
                  <option value="">Whole tour</option>
                  {nodes.map((n) => <option key={n.id} value={n.id}>{n.label}</option>)}
                </SelectField>
              ) : <span />}
              <Button type="submit" variant="primary" pending={pending}>Post comment</Button>
            </div>
          </form>
        ) : (
          <p className="border-t border-line pt-4 text-xs text-faint">Your role can read the discussion but not comment.</p>
        )}
      </CardBody>
    </Card>
  );
}

export interface PinnedCommentsProps {
  tourId: number;
  nodeId: string;
  /** Link to the full discussion (default /tours/[id]/discussion). */
  discussionHref?: string;
  className?: string;
}

/** The comments pinned to one node, compact and read-only (for the Encounter card). Shares the swr cache with CommentsPanel. */
export function PinnedComments({ tourId, nodeId, discussionHref, className }: PinnedCommentsProps) {
  const { data, error } = useSWR<CommentList>(key(tourId), fetcher);
  const items = (data?.items ?? []).filter((c) => c.nodeId === nodeId);
  const href = discussionHref ?? `/tours/${tourId}/discussion`;
  return (
    <div className={className} data-testid="pinned-comments">
      <div className="mb-1.5 flex items-baseline justify-between gap-2">
        <h4 className="text-xs font-semibold uppercase tracking-wide text-muted">Notes on this node</h4>
        <a href={href} className="text-xs text-muted underline-offset-2 hover:text-ink hover:underline">Discussion</a>
      </div>
      {error ? (
        <p className="text-xs text-bad">Could not load comments.</p>
      ) : !data ? (
        <Spinner size={12} />
      ) : items.length === 0 ? (
        <p className="text-xs text-faint">No comments pinned here.</p>
      ) : (
        <ul className="space-y-1.5">
          {items.slice(-3).map((c) => (
            <li key={c.id} className="text-xs">
              <span className="font-medium text-ink">{c.authorName ?? "Former member"}</span>{" "}
              <span className="text-muted">{c.body.length > 160 ? `${c.body.slice(0, 157)}…` : c.body}</span>
            </li>
          ))}
          {items.length > 3 ? <li className="text-xs text-faint">and {items.length - 3} more in the discussion</li> : null}
        </ul>
      )}
    </div>
  );
}
