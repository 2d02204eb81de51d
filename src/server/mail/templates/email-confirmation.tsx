import { Text } from "@react-email/components";
import { ActionLink, MailLayout } from "./layout";

export function EmailConfirmationMail({ name, link, expiresInDays }: { name: string; link: string; expiresInDays: number }) {
  return (
    <MailLayout preview="Confirm your e-mail address for Borewise">
      <Text>Hello {name},</Text>
      <Text>Your shop is set up. Confirm that this address is yours, so the shop can send invitations to your team.</Text>
      <ActionLink href={link}>Confirm my address</ActionLink>
      <Text>Or open this link: {link}</Text>
      <Text>The link works once and expires in {expiresInDays} days. If you did not sign up, ignore this message.</Text>
    </MailLayout>
  );
}
