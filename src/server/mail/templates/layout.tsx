import "server-only";
import type { ReactNode } from "react";
import { Body, Container, Head, Hr, Html, Preview, Section, Text } from "@react-email/components";

// Borewise's own mail look: paper background, graphite text, one blued-steel accent.
export const mailColours = { paper: "#f6f4ee", raised: "#fffdf8", ink: "#1f2328", soft: "#4a5058", steel: "#1d4f8c", rule: "#d3cdbf" };

export function MailLayout({ preview, children }: { preview: string; children: ReactNode }) {
  return (
    <Html lang="en">
      <Head />
      <Preview>{preview}</Preview>
      <Body style={{ backgroundColor: mailColours.paper, color: mailColours.ink, fontFamily: "Helvetica, Arial, sans-serif", margin: 0, padding: "24px 0" }}>
        <Container style={{ backgroundColor: mailColours.raised, border: `1px solid ${mailColours.rule}`, borderRadius: 8, maxWidth: 560, padding: 24 }}>
          <Text style={{ fontSize: 18, fontWeight: 700, margin: "0 0 16px" }}>Borewise</Text>
          <Section>{children}</Section>
          <Hr style={{ borderColor: mailColours.rule, margin: "24px 0 12px" }} />
          <Text style={{ color: mailColours.soft, fontSize: 12, margin: 0 }}>
            You get this message because someone used your address in Borewise. If that was not you, ignore it.
          </Text>
        </Container>
      </Body>
    </Html>
  );
}

export function ActionLink({ href, children }: { href: string; children: ReactNode }) {
  return (
    <Text style={{ margin: "20px 0" }}>
      <a href={href} style={{ backgroundColor: mailColours.steel, borderRadius: 6, color: "#ffffff", display: "inline-block", fontWeight: 700, padding: "12px 20px", textDecoration: "none" }}>
        {children}
      </a>
    </Text>
  );
}
