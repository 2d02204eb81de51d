import { describe, expect, it } from "vitest";
import { Document, Page, Text } from "@react-pdf/renderer";
import { PDF_FONTS } from "./fonts";
import { pdfResponse, renderPdf } from "./render";
import { pdfFonts, pdfText } from "./pdf-text";

describe("the PDF module", () => {
  it("embeds the shipped faces, so µ, ° and Ø come through as text", async () => {
    const bytes = await renderPdf(
      <Document>
        <Page size="A4">
          <Text style={{ fontFamily: PDF_FONTS.text }}>Bore Ø 94.012 mm, Ra 0.45 µm, crosshatch 45°</Text>
          <Text style={{ fontFamily: PDF_FONTS.figures, fontWeight: 600 }}>Ø 3.7013 in ± 0.02 thou</Text>
        </Page>
      </Document>,
    );
    expect(bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    const text = await pdfText(bytes);
    expect(text).toContain("Bore Ø 94.012 mm, Ra 0.45 µm, crosshatch 45°");
    expect(text).toContain("Ø 3.7013 in ± 0.02 thou");
    const fonts = await pdfFonts(bytes);
    expect(fonts).toMatch(/Inter/);
    expect(fonts).toMatch(/SourceCodePro/);
    expect(fonts).not.toMatch(/Helvetica/);
  });

  it("answers a PDF with a clean file name and no caching", async () => {
    const res = pdfResponse(new Uint8Array([37, 80, 68, 70]), "record #12 v1.pdf", "attachment");
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="record__12_v1.pdf"');
    expect(res.headers.get("cache-control")).toContain("no-store");
  });
});
