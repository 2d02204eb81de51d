import "server-only";
import { Text } from "@react-email/components";
import { ActionLink, MailLayout } from "./layout";

export type InvoiceMailProps = { shopName: string; customerName: string; numberText: string; total: string; currency: string; dueOn: string | null; payLink: string };

export function InvoiceMail(p: InvoiceMailProps) {
  return (
    <MailLayout preview={`Invoice ${p.numberText} from ${p.shopName}: ${p.total} ${p.currency}`}>
      <Text>Hello {p.customerName},</Text>
      <Text>{p.shopName} has finished the work. Invoice {p.numberText} is attached as a PDF: {p.total} {p.currency}{p.dueOn ? `, due on ${p.dueOn}` : ""}.</Text>
      <ActionLink href={p.payLink}>Pay by card</ActionLink>
      <Text>Or open this link: {p.payLink}</Text>
      <Text>The card payment page is the payment provider&apos;s own. If the link has expired, ask {p.shopName} for a new one.</Text>
    </MailLayout>
  );
}
