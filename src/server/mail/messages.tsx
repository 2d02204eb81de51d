import "server-only";
import { render } from "@react-email/render";
import type { ReactElement } from "react";
import { env } from "@/env";
import { InvitationMail, type InvitationMailProps } from "./templates/invitation";
import { PasswordResetMail } from "./templates/password-reset";
import { PasswordChangedMail } from "./templates/password-changed";
import { EmailConfirmationMail } from "./templates/email-confirmation";
import { RecordMail, type RecordMailProps } from "./templates/record";
import { QuoteMail, type QuoteMailProps } from "./templates/quote";
import { InvoiceMail, type InvoiceMailProps } from "./templates/invoice";

export type RenderedMail = { subject: string; html: string; text: string };

async function renderBoth(subject: string, element: ReactElement): Promise<RenderedMail> {
  const [html, text] = await Promise.all([render(element), render(element, { plainText: true })]);
  return { subject, html, text };
}

export const appUrl = (path: string) => new URL(path, env.APP_URL).toString();

export function invitationMessage(props: Omit<InvitationMailProps, "link"> & { token: string }): Promise<RenderedMail> {
  const link = appUrl(`/invite/${props.token}`);
  return renderBoth(`Join ${props.shopName} on Borewise`, <InvitationMail {...props} link={link} />);
}

export function passwordResetMessage(token: string, expiresInMinutes: number): Promise<RenderedMail> {
  return renderBoth("Reset your Borewise password", <PasswordResetMail link={appUrl(`/reset/${token}`)} expiresInMinutes={expiresInMinutes} />);
}

export function emailConfirmationMessage(name: string, token: string, expiresInDays: number): Promise<RenderedMail> {
  return renderBoth("Confirm your e-mail address for Borewise", <EmailConfirmationMail name={name} link={appUrl(`/confirm/${token}`)} expiresInDays={expiresInDays} />);
}

export function passwordChangedMessage(name: string): Promise<RenderedMail> {
  return renderBoth("Your Borewise password was changed", <PasswordChangedMail name={name} signInUrl={appUrl("/reset")} />);
}

export function recordMessage(props: Omit<RecordMailProps, "link"> & { token: string }): Promise<RenderedMail> {
  const subject = `Machining record, job #${props.jobNumber}${props.version > 1 ? ` (version ${props.version})` : ""}: ${props.shopName}`;
  return renderBoth(subject, <RecordMail {...props} link={appUrl(`/records/${props.token}`)} />);
}

export function quoteMessage(props: Omit<QuoteMailProps, "link"> & { token: string }): Promise<RenderedMail> {
  return renderBoth(`Quote from ${props.shopName}`, <QuoteMail {...props} link={appUrl(`/quote/${props.token}`)} />);
}

export function invoiceMessage(props: InvoiceMailProps): Promise<RenderedMail> {
  return renderBoth(`Invoice ${props.numberText} from ${props.shopName}`, <InvoiceMail {...props} />);
}
