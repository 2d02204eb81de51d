import "server-only";
import { Text } from "@react-email/components";
import { MailLayout } from "./layout";

// ASVS 4.0.3 V2.2.3: tell the user after a credential change, with no secret in the message.
export function PasswordChangedMail({ name, signInUrl }: { name: string; signInUrl: string }) {
  return (
    <MailLayout preview="Your Borewise password was changed">
      <Text>Hello {name},</Text>
      <Text>The password of your Borewise account was just changed, and your other sessions were signed out.</Text>
      <Text>If you did not do this, reset your password now from the sign-in page: {signInUrl}</Text>
    </MailLayout>
  );
}
