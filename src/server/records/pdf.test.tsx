import { describe, expect, it } from "vitest";
import { buildRecordView } from "@/shared/records/view";
import { sampleRecordSource } from "@/shared/records/fixture";
import { pdfText } from "@/server/pdf/pdf-text";
import { renderRecordPdf } from "./pdf";

describe("the record's PDF", () => {
  it("carries every cylinder's finished sizes and clearance with units, and µ ° Ø as text (metric, A4)", async () => {
    const record = buildRecordView(sampleRecordSource(), "metric");
    const text = await pdfText(await renderRecordPdf(record, { number: 2, replaces: 1 }));
    for (const c of record.cylinders) {
      expect(text).toContain(`Cylinder ${c.number}`);
      for (const l of c.levels) expect(text).toContain(l.a.text);
      expect(text).toContain(`${c.clearance.min.text} – ${c.clearance.max.text}`);
      expect(text).toContain(c.taper.text);
    }
    expect(text).toContain("Ø 93.920 mm");
    expect(text).toContain("µm");
    expect(text).toContain("20 °C");
    expect(text).toContain("Job #12, version 2");
    expect(text).toContain("Replaces version 1");
    expect(text).toContain("Follow the makers' run-in instructions.");
  });

  it("writes an inch record in inches and thou", async () => {
    const record = buildRecordView(sampleRecordSource(), "inch");
    const text = await pdfText(await renderRecordPdf(record, null));
    expect(text).toContain("3.7012 in");
    expect(text).toContain("3.54 thou");
    expect(text).not.toContain(" mm");
  });
});
