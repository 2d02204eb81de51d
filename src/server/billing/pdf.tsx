import "server-only";
import { Document, Image, Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import { PDF_COLOURS, PDF_FONTS } from "@/server/pdf/fonts";
import { renderPdf } from "@/server/pdf/render";
import { amountText, quantityText, rateText } from "@/shared/billing/format";
import { dateText } from "@/shared/time";

// A quote or an invoice as a PDF, through the one PDF module (src/server/pdf): the same lines and totals
// the page shows, every amount with its currency. Money arrives in integer minor units.

const { ink: INK, soft: SOFT, rule: RULE, steel: STEEL } = PDF_COLOURS;

const s = StyleSheet.create({
  page: { fontFamily: PDF_FONTS.text, fontSize: 9.5, color: INK, padding: 40, paddingBottom: 56 },
  header: { flexDirection: "row", justifyContent: "space-between", borderBottomWidth: 1.5, borderBottomColor: STEEL, paddingBottom: 8, marginBottom: 14 },
  shopName: { fontSize: 14, fontWeight: 700 },
  title: { fontSize: 14, fontWeight: 700, color: STEEL, textAlign: "right" },
  soft: { color: SOFT },
  right: { textAlign: "right" },
  block: { marginBottom: 12 },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 3 },
  head: { fontSize: 7.5, color: SOFT, textTransform: "uppercase" },
  description: { width: "44%" },
  cell: { width: "14%", textAlign: "right", fontFamily: PDF_FONTS.figures },
  totals: { marginTop: 8, marginLeft: "56%" },
  total: { flexDirection: "row", justifyContent: "space-between", paddingVertical: 2 },
  grand: { fontWeight: 700, fontSize: 11, borderTopWidth: 1, borderTopColor: INK, paddingTop: 4 },
  figure: { fontFamily: PDF_FONTS.figures },
  footer: { position: "absolute", bottom: 24, left: 40, right: 40, fontSize: 7.5, color: SOFT },
});

export type BillingPdfLine = { description: string; quantityMilli: number; unitPriceMinor: number; taxRateBp: number; netMinor: number };
export type BillingPdf = {
  kind: "Quote" | "Invoice";
  /** "Invoice INV-0012", "Quote for job #12", … */
  title: string;
  shopName: string;
  customerName: string;
  facts: Array<{ label: string; value: string }>;
  lines: BillingPdfLine[];
  currency: string;
  currencyDigits: number;
  netMinor: number;
  taxMinor: number;
  totalMinor: number;
  note: string;
  /** The closing words: terms, the accept or pay link. */
  closing: string[];
  /** The shop's logo (PNG or JPEG bytes, src/server/records/logo.ts), or null. */
  logo: Buffer | null;
};

function BillingDocument({ doc }: { doc: BillingPdf }) {
  const money = (minor: number) => `${amountText(minor, doc.currencyDigits)} ${doc.currency}`;
  return (
    <Document title={doc.title} author={doc.shopName} creator="Borewise">
      <Page size="A4" style={s.page}>
        <View style={s.header}>
          <View style={{ flexDirection: "row", gap: 8 }}>
            {/* eslint-disable-next-line jsx-a11y/alt-text -- a PDF image has no alt attribute; the shop name beside it says the same */}
            {doc.logo ? <Image src={doc.logo} style={{ width: 48, height: 48, objectFit: "contain" }} /> : null}
            <View>
              <Text style={s.shopName}>{doc.shopName}</Text>
              <Text style={s.soft}>To {doc.customerName}</Text>
            </View>
          </View>
          <View>
            <Text style={s.title}>{doc.title}</Text>
            {doc.facts.map((f) => <Text key={f.label} style={[s.soft, s.right]}>{f.label}: {f.value}</Text>)}
          </View>
        </View>
        <View style={[s.row, s.head]}>
          <Text style={s.description}>Description</Text>
          <Text style={s.cell}>Quantity</Text>
          <Text style={s.cell}>Unit price</Text>
          <Text style={s.cell}>Tax</Text>
          <Text style={s.cell}>Net</Text>
        </View>
        {doc.lines.map((l, i) => (
          <View key={i} style={s.row} wrap={false}>
            <Text style={s.description}>{l.description}</Text>
            <Text style={s.cell}>{quantityText(l.quantityMilli)}</Text>
            <Text style={s.cell}>{money(l.unitPriceMinor)}</Text>
            <Text style={s.cell}>{rateText(l.taxRateBp)}</Text>
            <Text style={s.cell}>{money(l.netMinor)}</Text>
          </View>
        ))}
        <View style={s.totals}>
          <View style={s.total}><Text>Net</Text><Text style={s.figure}>{money(doc.netMinor)}</Text></View>
          <View style={s.total}><Text>Tax</Text><Text style={s.figure}>{money(doc.taxMinor)}</Text></View>
          <View style={[s.total, s.grand]}><Text>Total</Text><Text style={s.figure}>{money(doc.totalMinor)}</Text></View>
        </View>
        {doc.note ? <View style={[s.block, { marginTop: 14 }]}><Text>{doc.note}</Text></View> : null}
        {doc.closing.map((line) => <Text key={line} style={[s.soft, { marginTop: 4 }]}>{line}</Text>)}
        <Text style={s.footer} fixed render={({ pageNumber, totalPages }) => `${doc.title} · page ${pageNumber} of ${totalPages}`} />
      </Page>
    </Document>
  );
}


type QuoteRow = { id: string; customerName: string; note: string; currency: string; netMinor: number; taxMinor: number; totalMinor: number; estimatedMinutes: number | null; sentAt: Date | null; createdAt: Date };

/** A quote's document from its row and lines; `closing` carries the accept link's words in a sent copy. */
export function quotePdfDocument({ quote, lines, shopName, timeZone, jobNumber, closing = [], logo = null }: {
  quote: QuoteRow; lines: BillingPdfLine[]; shopName: string; timeZone: string; jobNumber: number | null; closing?: string[]; logo?: Buffer | null;
}): { doc: BillingPdf; filename: string } {
  const facts = [
    ...(jobNumber !== null ? [{ label: "Job", value: `#${jobNumber}` }] : []),
    { label: "Date", value: dateText(quote.sentAt ?? quote.createdAt, timeZone) },
    ...(quote.estimatedMinutes ? [{ label: "Estimated machine time", value: `${(quote.estimatedMinutes / 60).toFixed(2)} h` }] : []),
  ];
  return {
    filename: `quote-${jobNumber !== null ? `job-${jobNumber}-` : ""}${quote.id.slice(0, 8)}.pdf`,
    doc: {
      kind: "Quote", title: jobNumber !== null ? `Quote for job #${jobNumber}` : "Quote", shopName, customerName: quote.customerName, facts, lines,
      currency: quote.currency, currencyDigits: 2, netMinor: quote.netMinor, taxMinor: quote.taxMinor, totalMinor: quote.totalMinor, note: quote.note, closing, logo,
    },
  };
}

type InvoiceRow = Omit<QuoteRow, "estimatedMinutes" | "sentAt"> & { numberText: string | null; currencyDigits: number; issuedAt: Date | null; dueAt: Date | null; paidAt: Date | null; status: string; voidReason: string | null };

/** An invoice's document: numbered once issued, marked as a draft before. */
export function invoicePdfDocument({ invoice, lines, shopName, timeZone, jobNumber, closing = [], logo = null }: {
  invoice: InvoiceRow; lines: BillingPdfLine[]; shopName: string; timeZone: string; jobNumber: number; closing?: string[]; logo?: Buffer | null;
}): { doc: BillingPdf; filename: string } {
  const facts = [
    { label: "Job", value: `#${jobNumber}` },
    ...(invoice.issuedAt ? [{ label: "Issued", value: dateText(invoice.issuedAt, timeZone) }] : []),
    ...(invoice.dueAt ? [{ label: "Due", value: dateText(invoice.dueAt, timeZone) }] : []),
    ...(invoice.paidAt ? [{ label: "Paid", value: dateText(invoice.paidAt, timeZone) }] : []),
    ...(invoice.status === "void" ? [{ label: "Void", value: invoice.voidReason ?? "" }] : []),
  ];
  return {
    filename: `invoice-${invoice.numberText ?? `draft-${invoice.id.slice(0, 8)}`}.pdf`,
    doc: {
      kind: "Invoice", title: invoice.numberText ? `Invoice ${invoice.numberText}` : "Invoice (draft, not issued)", shopName, customerName: invoice.customerName, facts, lines,
      currency: invoice.currency, currencyDigits: invoice.currencyDigits, netMinor: invoice.netMinor, taxMinor: invoice.taxMinor, totalMinor: invoice.totalMinor, note: invoice.note, closing, logo,
    },
  };
}

/** The PDF bytes of a quote or an invoice. */
export function billingPdf(doc: BillingPdf): Promise<Buffer> {
  return renderPdf(<BillingDocument doc={doc} />);
}
