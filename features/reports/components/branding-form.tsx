"use client";

import { useState } from "react";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Field } from "@/lib/ui/field";
import { Input } from "@/lib/ui/input";
import { useBranding, useUpdateBranding, useUploadLogo } from "@/features/reports/api/reports";
import type { TBrandingDto } from "@/features/reports/schemas/report";

/** The dealer admin's report branding: printed name, contact line, currency and logo. */
export function BrandingForm() {
  const branding = useBranding();
  if (branding.isPending) return <p className="text-ink-600">Loading…</p>;
  if (branding.isError) return <p role="alert">{branding.error.message}</p>;
  return <Form b={branding.data} />;
}

function Form({ b }: { b: TBrandingDto }) {
  const update = useUpdateBranding();
  const upload = useUploadLogo();
  const [displayName, setDisplayName] = useState(b.displayName);
  const [contactLine, setContactLine] = useState(b.contactLine);
  const [currency, setCurrency] = useState(b.currency);
  return (
    <div className="flex flex-col gap-4">
      <Card title="Printed on every new report">
        <form
          className="flex flex-col gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            update.mutate({ displayName, contactLine, currency });
          }}
        >
          <Field label="Dealership name as printed">
            <Input value={displayName} onChange={(e) => setDisplayName(e.target.value)} />
          </Field>
          <Field label="Contact line" hint="Address, telephone, e-mail: one line.">
            <Input value={contactLine} onChange={(e) => setContactLine(e.target.value)} />
          </Field>
          <Field
            label="Currency"
            hint="ISO 4217 code, e.g. GBP, EUR, USD."
            error={update.error?.message}
          >
            <Input value={currency} maxLength={3} onChange={(e) => setCurrency(e.target.value)} />
          </Field>
          <div>
            <Button type="submit" busy={update.isPending}>
              Save branding
            </Button>
          </div>
          {update.isSuccess ? (
            <p role="status" className="text-sm text-furrow-800">
              Saved. Reports issued from now on carry it; issued versions keep theirs.
            </p>
          ) : null}
        </form>
      </Card>
      <Card title="Logo">
        {b.hasLogo ? (
          // eslint-disable-next-line @next/next/no-img-element
          <img
            src={`/api/v1/branding/logo?v=${encodeURIComponent(b.updatedAt ?? "")}`}
            alt="Current logo"
            className="mb-3 max-h-20 max-w-64"
          />
        ) : (
          <p className="mb-3 text-sm text-ink-600">No logo yet.</p>
        )}
        <Field
          label="Upload a logo"
          hint="PNG or JPEG, at most 2 MB; stored re-encoded, fitted inside 800 × 320 px."
          error={upload.error?.message}
        >
          <input
            type="file"
            accept="image/png,image/jpeg"
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) upload.mutate(file);
            }}
          />
        </Field>
      </Card>
    </div>
  );
}
