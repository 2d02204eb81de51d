import "server-only";
import { Text } from "@react-email/components";
import { ActionLink, MailLayout } from "./layout";

export function PasswordResetMail({ link, expiresInMinutes }: { link: string; expiresInMinutes: number }) {
  return (
    <MailLayout preview="Choose a new Borewise password">
      <Text>Someone asked to reset the password of your Borewise account. To choose a new password, open the link below.</Text>
      <ActionLink href={link}>Choose a new password</ActionLink>
      <Text>Or open this link: {link}</Text>
      <Text>The link works once and expires in {expiresInMinutes} minutes. If you did not ask for this, ignore this message: your password stays as it is.</Text>
    </MailLayout>
  );
}
