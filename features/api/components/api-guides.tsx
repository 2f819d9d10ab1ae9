import type { ReactNode } from "react";

function Guide({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-2">
      <h2 id={id} className="text-xl font-semibold text-ink-900">
        {title}
      </h2>
      {children}
    </section>
  );
}

function Code({ children }: { children: string }) {
  return (
    <pre className="overflow-x-auto rounded-md bg-ink-900 px-3 py-2 text-xs leading-relaxed text-ink-50">
      <code>{children}</code>
    </pre>
  );
}

/** Four short guides for a dealer's own systems: sign in with a token, import, estimate, report. */
export function ApiGuides({ origin }: { origin: string }) {
  const base = `${origin}/api/v1`;
  return (
    <div className="flex flex-col gap-8">
      <Guide id="guide-authenticate" title="1. Authenticate">
        <p className="max-w-prose text-sm text-ink-700">
          A dealer admin makes a token under <strong>API tokens</strong> in the workspace menu,
          choosing its scopes: <em>Read</em>, <em>Read and write</em> and <em>Reports</em>. The
          token is shown once; Treadcast keeps only a hash of it. Send it on every request. A token
          acts for the admin who made it, inside its scopes and its dealership only; every change it
          makes goes into the audit log. Past its requests per minute the API answers 429 with{" "}
          <code>Retry-After</code>; a revoked or expired token gets 401.
        </p>
        <Code>{`export TREADCAST_TOKEN=tcapi_…   # from Settings → API tokens
curl -s ${base}/customers -H "Authorization: Bearer $TREADCAST_TOKEN"`}</Code>
        <p className="max-w-prose text-sm text-ink-700">
          Errors are always <code>{`{ "error": { "code", "message", "fieldErrors"? } }`}</code>.
          Creating requests accept an <code>Idempotency-Key</code> header: a retry with the same key
          within 24 hours returns the first answer instead of creating a second record.
        </p>
      </Guide>
      <Guide id="guide-upload" title="2. Upload a telematics CSV and import it">
        <p className="max-w-prose text-sm text-ink-700">
          Send the file&apos;s bytes as the body (streamed; up to the upload limit), then create a
          duty cycle from it with a column mapping. The import runs in the background: poll the duty
          cycle until its status is <code>ready</code> (or <code>failed</code>, with the reason).
        </p>
        <Code>{`curl -s -X POST ${base}/uploads \\
  -H "Authorization: Bearer $TREADCAST_TOKEN" \\
  -H "Content-Type: text/csv" -H "X-File-Name: loader-november.csv" \\
  --data-binary @loader-november.csv
# → { "id": "<uploadId>", "sha256": "…", … }

curl -s -X POST ${base}/duty-cycles \\
  -H "Authorization: Bearer $TREADCAST_TOKEN" -H "Content-Type: application/json" \\
  -H "Idempotency-Key: loader-november-import" \\
  -d '{ "source": "upload", "name": "Loader, November", "customerId": "<customerId>",
        "machineId": "<machineId>", "uploadId": "<uploadId>",
        "mapping": { "kind": "telematics", "delimiter": ",", "decimal": ".", "hasHeader": true,
          "encoding": "utf-8",
          "columns": { "time": { "index": 0, "unit": "s" }, "speed": { "index": 1, "unit": "km/h" },
                       "yawRate": { "index": 2, "unit": "deg/s" } },
          "defaults": { "surface": "firm-soil", "loadState": "unladen" } } }'

curl -s ${base}/duty-cycles/<dutyCycleId> -H "Authorization: Bearer $TREADCAST_TOKEN"
# repeat until "status": "ready"`}</Code>
      </Guide>
      <Guide id="guide-estimate" title="3. Run an estimate">
        <p className="max-w-prose text-sm text-ink-700">
          An estimate runs the engine for a machine on a duty cycle and stores the result: per tyre
          position the scrub energy, wear, hours to replacement and cost per operating hour (in the
          dealership&apos;s currency). It is an engineering estimate: take load, pressure and speed
          limits from the tyre and machine makers&apos; data.
        </p>
        <Code>{`curl -s -X POST ${base}/estimates \\
  -H "Authorization: Bearer $TREADCAST_TOKEN" -H "Content-Type: application/json" \\
  -d '{ "machineId": "<machineId>", "dutyCycleId": "<dutyCycleId>" }'
# → { "id": "<estimateId>", "costPerHour": …, "result": { "positions": [ … ] } }`}</Code>
      </Guide>
      <Guide id="guide-report" title="4. Fetch a report PDF">
        <p className="max-w-prose text-sm text-ink-700">
          With the <em>Reports</em> scope: start a draft from the estimate, issue it (this counts
          against the report plan; 402 when the allowance is used up), then download the issued
          version as PDF.
        </p>
        <Code>{`curl -s -X POST ${base}/reports -H "Authorization: Bearer $TREADCAST_TOKEN" \\
  -H "Content-Type: application/json" -d '{ "estimateId": "<estimateId>" }'
curl -s -X POST ${base}/reports/<reportId>/issue -H "Authorization: Bearer $TREADCAST_TOKEN"
curl -s -o quote.pdf ${base}/reports/<reportId>/versions/latest/pdf \\
  -H "Authorization: Bearer $TREADCAST_TOKEN"`}</Code>
      </Guide>
    </div>
  );
}
