"use client";

import Link from "next/link";
import { useState } from "react";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Caution } from "@/lib/ui/caution";
import { Field } from "@/lib/ui/field";
import { Input, Textarea } from "@/lib/ui/input";
import { ApiError } from "@/lib/query/api-fetch";
import { STATUS_LABELS } from "@/lib/reports";
import {
  useIssueReport,
  usePatchReport,
  useReport,
  useShareReport,
  useWithdrawShare,
} from "@/features/reports/api/reports";
import type { TReportDto } from "@/features/reports/schemas/report";

const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString("en-GB") : "not yet");

/** The estimator's side of a report: draft text, issue, share, opened times, withdrawal. */
export function ReportWorkbench({ reportId }: { reportId: string }) {
  const report = useReport(reportId);
  if (report.isPending) return <p className="text-ink-600">Loading report…</p>;
  if (report.isError)
    return (
      <p role="alert" className="text-danger-700">
        {report.error.message}
      </p>
    );
  return <Workbench r={report.data} />;
}

function Workbench({ r }: { r: TReportDto }) {
  const patch = usePatchReport(r.id);
  const issue = useIssueReport(r.id);
  const share = useShareReport(r.id);
  const withdraw = useWithdrawShare(r.id);
  const [title, setTitle] = useState(r.title);
  const [recommendations, setRecommendations] = useState(r.recommendations);
  const [note, setNote] = useState(r.customerNote);
  const [email, setEmail] = useState("");
  const dirty =
    title !== r.title || recommendations !== r.recommendations || note !== r.customerNote;
  const issueError = issue.error instanceof ApiError ? issue.error : null;
  const billingHref =
    issueError?.status === 402 ? String(issueError.body.billingHref ?? "/billing") : null;
  const liveShares = r.shares.filter((s) => !s.withdrawnAt);

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-3">
        <span
          className="rounded-full bg-furrow-100 px-3 py-1 text-sm font-medium text-furrow-800"
          data-testid="report-status"
        >
          {STATUS_LABELS[r.status]}
        </span>
        <span className="text-sm text-ink-700">
          {r.customerName} · {r.machineName}
          {r.estimateId ? (
            <>
              {" · "}
              <Link href={`/estimates/${r.estimateId}`} className="text-furrow-700 underline">
                source estimate
              </Link>
            </>
          ) : null}
          {r.sourceKind === "comparison" ? " · built from a stored comparison of options" : null}
        </span>
      </div>

      <Card title={r.latestVersion === 0 ? "Draft" : `Next version (${r.latestVersion + 1})`}>
        <form
          className="flex flex-col gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            patch.mutate({ title, recommendations, customerNote: note });
          }}
        >
          <Field label="Title" error={patch.error?.message}>
            <Input value={title} onChange={(e) => setTitle(e.target.value)} maxLength={160} />
          </Field>
          <Field label="Recommendations" hint="Printed in the report under its own heading.">
            <Textarea
              value={recommendations}
              onChange={(e) => setRecommendations(e.target.value)}
              rows={4}
            />
          </Field>
          <Field label="Note to the customer" hint="Shown at the top of the report.">
            <Textarea value={note} onChange={(e) => setNote(e.target.value)} rows={2} />
          </Field>
          <div className="flex flex-wrap gap-2">
            <Button type="submit" variant="secondary" busy={patch.isPending} disabled={!dirty}>
              Save draft
            </Button>
            <Button
              busy={issue.isPending}
              disabled={dirty}
              title={dirty ? "Save the draft first" : undefined}
              onClick={() => issue.mutate(undefined)}
            >
              {r.latestVersion === 0 ? "Issue report" : `Issue version ${r.latestVersion + 1}`}
            </Button>
          </div>
          {issueError ? (
            <Caution tone="danger" title={issueError.message}>
              {billingHref ? (
                <Link href={billingHref} className="font-medium underline">
                  See the dealership&apos;s report plan
                </Link>
              ) : null}
            </Caution>
          ) : null}
          <p className="text-xs text-ink-600">
            Issuing freezes the machine, fitment, duty cycle, figures
            {r.sourceKind === "comparison" ? " of every option with its payback" : ""} and this text
            into a version that never changes; later edits need a new version.
          </p>
        </form>
      </Card>

      {r.latestVersion > 0 ? (
        <Card title="Sharing with the customer">
          {liveShares.length > 0 ? (
            <ul className="mb-3 flex flex-col gap-2 text-sm" aria-label="Shares">
              {liveShares.map((s) => (
                <li key={s.id} className="rounded-md bg-ink-50 p-2" data-testid="share-row">
                  {s.email} {s.toAccount ? "(account)" : "(invited)"} · shared {when(s.sharedAt)} ·
                  first opened <span data-testid="first-opened">{when(s.firstOpenedAt)}</span> ·
                  last opened {when(s.lastOpenedAt)}
                </li>
              ))}
            </ul>
          ) : (
            <p className="mb-3 text-sm text-ink-600">Not shared yet.</p>
          )}
          <form
            className="flex flex-wrap items-end gap-2"
            onSubmit={(e) => {
              e.preventDefault();
              share.mutate(email ? { email } : {});
            }}
          >
            <Field
              label="E-mail (only if the customer has no account)"
              error={share.error?.message}
              hint="Customer accounts are e-mailed a link; otherwise the contact is invited."
            >
              <Input type="email" value={email} onChange={(e) => setEmail(e.target.value)} />
            </Field>
            <Button type="submit" busy={share.isPending}>
              Share with customer
            </Button>
            {liveShares.length > 0 ? (
              <Button
                variant="danger"
                busy={withdraw.isPending}
                onClick={() => withdraw.mutate(undefined)}
              >
                Withdraw sharing
              </Button>
            ) : null}
          </form>
          {share.data ? (
            <p role="status" className="mt-2 text-sm text-furrow-800">
              {share.data.message}
            </p>
          ) : null}
        </Card>
      ) : null}

      {r.versions.length > 0 ? (
        <Card title="Versions">
          <ul className="flex flex-col gap-1 text-sm">
            {r.versions.map((v) => (
              <li key={v.version}>
                <Link
                  href={`/reports/${r.id}/v/${v.version}`}
                  className="text-furrow-700 underline"
                >
                  Version {v.version}
                </Link>{" "}
                issued {when(v.issuedAt)}
                {v.supersededAt ? ` · superseded ${when(v.supersededAt)}` : " · current"}
              </li>
            ))}
          </ul>
        </Card>
      ) : null}
    </div>
  );
}
