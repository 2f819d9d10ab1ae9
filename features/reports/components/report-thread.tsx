"use client";

import { useState } from "react";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Field } from "@/lib/ui/field";
import { Textarea } from "@/lib/ui/input";
import { usePostMessage, useReportMessages } from "@/features/reports/api/reports";

/** Questions and replies on a report; each message is e-mailed to the other side. */
export function ReportThread({ reportId, asCustomer }: { reportId: string; asCustomer: boolean }) {
  const messages = useReportMessages(reportId);
  const post = usePostMessage(reportId);
  const [body, setBody] = useState("");
  return (
    <Card title={asCustomer ? "Ask your dealer" : "Questions from the customer"}>
      {messages.data && messages.data.length > 0 ? (
        <ol className="mb-4 flex flex-col gap-3" aria-label="Messages">
          {messages.data.map((m) => (
            <li
              key={m.id}
              className={`rounded-md p-3 text-sm ${m.fromCustomer ? "bg-ink-50" : "bg-furrow-50"}`}
            >
              <p className="text-xs text-ink-600">
                {m.authorName} · {new Date(m.createdAt).toLocaleString("en-GB")}
              </p>
              <p className="whitespace-pre-line text-ink-900">{m.body}</p>
            </li>
          ))}
        </ol>
      ) : (
        <p className="mb-3 text-sm text-ink-600">No messages yet.</p>
      )}
      <form
        className="flex flex-col gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          post.mutate({ body }, { onSuccess: () => setBody("") });
        }}
      >
        <Field
          label={asCustomer ? "Your question" : "Your reply"}
          error={post.error?.message}
          hint={asCustomer ? "Your dealer gets it by e-mail." : "The customer gets it by e-mail."}
        >
          <Textarea
            value={body}
            onChange={(e) => setBody(e.target.value)}
            rows={3}
            maxLength={4000}
          />
        </Field>
        <div>
          <Button type="submit" busy={post.isPending} disabled={!body.trim()}>
            {asCustomer ? "Send question" : "Send reply"}
          </Button>
        </div>
      </form>
    </Card>
  );
}
