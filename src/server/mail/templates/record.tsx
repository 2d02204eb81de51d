import "server-only";
import { Text } from "@react-email/components";
import { ActionLink, MailLayout } from "./layout";

export type RecordMailProps = { shopName: string; jobNumber: number; engine: string; version: number; link: string; expiresInDays: number };

export function RecordMail({ shopName, jobNumber, engine, version, link, expiresInDays }: RecordMailProps) {
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
    </MailLayout>
  );
}
