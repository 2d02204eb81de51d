import "server-only";
import type { ReactElement } from "react";
import { renderToBuffer, type DocumentProps } from "@react-pdf/renderer";
import { registerPdfFonts } from "./fonts";

/** Renders a react-pdf <Document> to the bytes of a PDF, with the shipped fonts embedded. */
export async function renderPdf(document: ReactElement<DocumentProps>): Promise<Buffer> {
  registerPdfFonts();
  return renderToBuffer(document);
}

/** A PDF answer for a route handler: inline (viewed in the browser) or as a download. */
export function pdfResponse(bytes: Uint8Array, filename: string, disposition: "inline" | "attachment" = "inline"): Response {
  return new Response(new Uint8Array(bytes), {
    headers: {
      "content-type": "application/pdf",
      "content-length": String(bytes.byteLength),
      "content-disposition": `${disposition}; filename="${filename.replace(/[^A-Za-z0-9._-]/g, "_")}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
}
