import "server-only";
import { Text } from "@react-email/components";
import { ActionLink, MailLayout } from "./layout";

/** The job's open invoice, when it has one: its payment link, or null when only the record's page offers it. */
export type RecordMailInvoice = { numberText: string; amount: string; payLink: string | null };
export type RecordMailProps = { shopName: string; jobNumber: number; engine: string; version: number; link: string; expiresInDays: number; invoice?: RecordMailInvoice | null };

export function RecordMail({ shopName, jobNumber, engine, version, link, expiresInDays, invoice = null }: RecordMailProps) {
  return (
    <MailLayout preview={`${shopName}: the machining record of job #${jobNumber}`}>
      <Text>
        <strong>{shopName}</strong> sends you the machining record of job #{jobNumber} ({engine}): every bore&apos;s finished size,
        its clearance to the matched piston, taper, out-of-round and finish.
      </Text>
      {version > 1 ? <Text>This is version {version}; it replaces version {version - 1}.</Text> : null}
      <Text>The record is attached as a PDF. You can also view it online, no account needed:</Text>
      <ActionLink href={link}>View the machining record</ActionLink>
      <Text>Or open this link: {link}</Text>
      <Text>The link works for {expiresInDays} days; keep the PDF for your files.</Text>
      {invoice ? (
        <>
          <Text>Invoice {invoice.numberText} for this work is open: {invoice.amount}. You can pay it by card{invoice.payLink ? "" : " from the record's page"}:</Text>
          <ActionLink href={invoice.payLink ?? link}>Pay invoice {invoice.numberText}</ActionLink>
          <Text>Or open this link: {invoice.payLink ?? link}</Text>
        </>
      ) : null}
    </MailLayout>
  );
}
