"use client";

import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { useSWRConfig } from "swr";
import { ApiError, sendJson } from "@/lib/client/fetcher";
import { can, type Role } from "@/lib/auth/roles";
import { TRANSITIONS, actionsFrom, type ReviewAction, type TourStatus } from "@/lib/tours/review-flow";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/field";
import { StatusBadge } from "@/components/ui/badge";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { InlineAlert } from "./inline-alert";
import { useMounted } from "./use-mounted";

export interface ReviewPanelProps {
  tourId: number;
  status: TourStatus;
  /** The tour version the caller is looking at (sent with the action; a stale one is refused). */
  version: number;
  role: Role;
  /** The signed-in user owns the tour (shown as a hint only: the server decides). */
  isOwner: boolean;
  /** Called after a transition with the new status and version (and the full tour detail). */
  onChanged?: (next: { status: TourStatus; version: number; tour: unknown }) => void;
  className?: string;
}

const STATUS_HINT: Record<TourStatus, string> = {
  draft: "A draft: designers are still working on it. Submit it when it is ready for a lead's decision.",
  in_review: "Waiting for a lead: baseline it, or return it to the designer with a comment.",
  returned: "Returned for changes. Rework it, then submit it again.",
  baselined: "Baselined: read-only, the team's reference. A lead can reopen it as a draft (with a comment).",
};

const VARIANT: Record<ReviewAction, "primary" | "secondary" | "danger"> = {
  submit: "primary",
  baseline: "primary",
  return: "danger",
  reopen: "secondary",
};

/**
 * Review: the tour's status, the transitions the role may make from it, and a comment box.
 * Self-contained: it posts to /api/tours/[id]/review and refreshes the tour's comments and
 * revisions (swr keys under /api/tours/[id]/) and the server-rendered page.
 */
export function ReviewPanel({ tourId, status: initialStatus, version: initialVersion, role, isOwner, onChanged, className }: ReviewPanelProps) {
  const router = useRouter();
  const ready = useMounted();
  const { mutate } = useSWRConfig();
  const [status, setStatus] = useState(initialStatus);
  const [version, setVersion] = useState(initialVersion);
  const [comment, setComment] = useState("");
  const [pending, setPending] = useState<ReviewAction | null>(null);
  const [error, setError] = useState<{ message: string; conflict: boolean } | null>(null);
  const [commentError, setCommentError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  useEffect(() => {
    setStatus(initialStatus);
    setVersion(initialVersion);
  }, [initialStatus, initialVersion]);

  const actions = actionsFrom(status).filter((a) => can(role, TRANSITIONS[a].permission));
  const needsComment = actions.some((a) => TRANSITIONS[a].commentRequired);

  async function run(action: ReviewAction) {
    const t = TRANSITIONS[action];
    setError(null);
    setDone(null);
    if (t.commentRequired && !comment.trim()) {
      setCommentError(`A comment is required to ${action === "return" ? "return" : "reopen"} a tour: say what needs to change.`);
      return;
    }
    setCommentError(null);
    setPending(action);
    try {
      const r = await sendJson<{ status: TourStatus; version: number; notified: string[]; tour: unknown }>(`/api/tours/${tourId}/review`, "POST", {
        action,
        comment: comment.trim() || undefined,
        version,
      });
      setStatus(r.status);
      setVersion(r.version);
      setComment("");
      setDone(`Tour ${t.past}.${r.notified.length ? ` E-mailed ${r.notified.join(", ")}.` : ""}`);
      onChanged?.({ status: r.status, version: r.version, tour: r.tour });
      void mutate((key) => typeof key === "string" && key.startsWith(`/api/tours/${tourId}/`));
      router.refresh();
    } catch (err) {
      if (err instanceof ApiError) {
        if (err.status === 400 && err.issues.some((i) => i.path === "comment")) setCommentError(err.message);
        else setError({ message: err.message, conflict: err.status === 409 });
      } else setError({ message: "Could not reach the server. Try again.", conflict: false });
    } finally {
      setPending(null);
    }
  }

  return (
    <Card className={className} data-testid="review-panel" data-ready={ready || undefined}>
      <CardHeader
        title="Review"
        description={<>Version <span className="num">{version}</span>{isOwner ? " · you own this tour" : ""}</>}
        actions={<StatusBadge status={status} />}
      />
      <CardBody className="space-y-4">
        <p className="text-sm text-muted">{STATUS_HINT[status]}</p>
        {actions.length > 0 ? (
          <>
            <TextareaField
              label="Review comment"
              name="review-comment"
              rows={3}
              value={comment}
              maxLength={4000}
              onChange={(e) => {
                setComment(e.target.value);
                if (commentError) setCommentError(null);
              }}
              error={commentError}
              hint={needsComment ? "Required to return or reopen; it is kept in the discussion and e-mailed." : "Optional; it is kept in the discussion and e-mailed."}
            />
            <div className="flex flex-wrap gap-2">
              {actions.map((a) => (
                <Button key={a} variant={VARIANT[a]} pending={pending === a} disabled={pending !== null} onClick={() => run(a)}>
                  {TRANSITIONS[a].label}
                </Button>
              ))}
            </div>
          </>
        ) : (
          <p className="text-sm text-faint">
            {status === "baselined" || status === "in_review" ? "Only a lead can change the status from here." : "Your role cannot submit tours for review."}
          </p>
        )}
        {error ? (
          <InlineAlert
            actions={
              error.conflict ? (
                <Button size="sm" onClick={() => { setError(null); router.refresh(); }}>
                  Reload
                </Button>
              ) : null
            }
          >
            {error.message}
          </InlineAlert>
        ) : null}
        {done ? <InlineAlert tone="ok">{done}</InlineAlert> : null}
      </CardBody>
    </Card>
  );
}
