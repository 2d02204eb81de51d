import "server-only";
import { Text } from "@react-email/components";
import { ActionLink, MailLayout } from "./layout";

export type InvitationMailProps = { shopName: string; inviterName: string; role: string; link: string; expiresInDays: number };

export function InvitationMail({ shopName, inviterName, role, link, expiresInDays }: InvitationMailProps) {
  return (
    <MailLayout preview={`${inviterName} invited you to ${shopName} on Borewise`}>
      <Text>
        {inviterName} invited you to join <strong>{shopName}</strong> on Borewise as {role === "apprentice" ? "an" : "a"} {role}.
      </Text>
      <ActionLink href={link}>Accept the invitation</ActionLink>
      <Text>Or open this link: {link}</Text>
      <Text>The link works once and expires in {expiresInDays} days.</Text>
    </MailLayout>
  );
}
