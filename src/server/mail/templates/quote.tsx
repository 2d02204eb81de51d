import "server-only";
import { Text } from "@react-email/components";
import { ActionLink, mailColours, MailLayout } from "./layout";

export type QuoteMailLine = { description: string; quantity: string; unitPrice: string; net: string; taxRate: string };
export type QuoteMailProps = {
  shopName: string; customerName: string; note: string; currency: string; lines: QuoteMailLine[];
  net: string; tax: string; total: string; estimatedHours: string | null; link: string; expiresOn: string;
};

const cell = { borderTop: `1px solid ${mailColours.rule}`, padding: "4px 6px", fontSize: 14 } as const;
const right = { ...cell, textAlign: "right" as const, whiteSpace: "nowrap" as const };

export function QuoteMail(p: QuoteMailProps) {
  return (
    <MailLayout preview={`Quote from ${p.shopName}: ${p.total} ${p.currency}`}>
      <Text>Hello {p.customerName},</Text>
      <Text>{p.shopName} has priced the work on your engine. The quote is below; accept or decline it from the link, no account needed.</Text>
      {p.note ? <Text>{p.note}</Text> : null}
      <table style={{ borderCollapse: "collapse", width: "100%" }} data-testid="quote-mail-lines">
        <thead>
          <tr>
            <th style={{ ...cell, textAlign: "left" }}>Item</th><th style={right}>Qty</th><th style={right}>Unit ({p.currency})</th><th style={right}>Tax</th><th style={right}>Net ({p.currency})</th>
          </tr>
        </thead>
        <tbody>
          {p.lines.map((l, i) => (
            <tr key={i}><td style={cell}>{l.description}</td><td style={right}>{l.quantity}</td><td style={right}>{l.unitPrice}</td><td style={right}>{l.taxRate} %</td><td style={right}>{l.net}</td></tr>
          ))}
          <tr><td style={cell} colSpan={4}>Net</td><td style={right}>{p.net}</td></tr>
          <tr><td style={cell} colSpan={4}>Tax</td><td style={right}>{p.tax}</td></tr>
          <tr><td style={{ ...cell, fontWeight: 700 }} colSpan={4}>Total</td><td style={{ ...right, fontWeight: 700 }}>{p.total} {p.currency}</td></tr>
        </tbody>
      </table>
      {p.estimatedHours ? <Text>Estimated machine time: {p.estimatedHours} h.</Text> : null}
      <ActionLink href={p.link}>View, accept or decline the quote</ActionLink>
      <Text>Or open this link: {p.link}</Text>
      <Text>The link works once and expires at {p.expiresOn}.</Text>
    </MailLayout>
  );
}
