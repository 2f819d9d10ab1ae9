import { createElement, type ReactElement } from "react";
import { renderToBuffer, type DocumentProps } from "@react-pdf/renderer";
import type { TReportContent } from "@/lib/reports";
import { ReportDocument } from "@/features/reports/pdf/report-document";
import { registerReportFonts } from "@/features/reports/pdf/fonts";

/** Renders a frozen report version to PDF bytes in the reader's unit system. */
export async function renderReportPdf(opts: {
  content: TReportContent;
  reportId: string;
  version: number;
  supersededAt: string | null;
  logo: Buffer | null;
  system: "metric" | "imperial";
}): Promise<Buffer> {
  registerReportFonts();
  const doc = createElement(ReportDocument, opts) as unknown as ReactElement<DocumentProps>;
  return renderToBuffer(doc);
}
