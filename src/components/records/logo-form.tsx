"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { FilePicker } from "@/components/ui/file-picker";
import { LOGO_EXTENSIONS, typesText } from "@/shared/uploads/file-rules";
import { describeBytes } from "@/shared/bytes";
import { sendForm } from "@/components/jobs/api";
import type { ObjectAction } from "@/shared/action-result";
import { LOGO_MAX_BYTES, LOGO_MAX_SIDE_PX } from "@/shared/records/logo";

// The shop's logo: upload (multipart to /api/settings/logo, a route handler like every upload),
// replace, remove (a server action).
export function LogoForm({ hasLogo, logoVersion, remove }: { hasLogo: boolean; logoVersion: string | null; remove: ObjectAction<Record<string, never>> }) {
  const router = useRouter();
  const [file, setFile] = useState<File | null>(null);
  const [pending, setPending] = useState(false);
  const [message, setMessage] = useState<{ tone: "stop" | "pass"; text: string } | null>(null);

  async function upload() {
    if (!file) return setMessage({ tone: "stop", text: `Choose a ${typesText(LOGO_EXTENSIONS)} picture first.` });
    const form = new FormData();
    form.append("file", file);
    setPending(true);
    const result = await sendForm<{ hasLogo: boolean }>("/api/settings/logo", form);
    setPending(false);
    if (!result.ok) return setMessage({ tone: "stop", text: result.error.fieldErrors?.file?.[0] ?? result.error.message });
    setFile(null);
    setMessage({ tone: "pass", text: "Logo saved. Records, quotes and invoices show it from now on." });
    router.refresh();
  }
  async function removeLogo() {
    setPending(true);
    const result = await remove(null, {});
    setPending(false);
    setMessage(result.ok ? { tone: "pass", text: "Logo removed." } : { tone: "stop", text: result.message });
    router.refresh();
  }

  return (
    <div className="flex flex-col gap-4" data-testid="logo-form">
      <div className="flex flex-wrap items-center gap-4">
        <div className="flex h-24 w-24 items-center justify-center rounded-md border border-rule bg-paper">
          {/* eslint-disable-next-line @next/next/no-img-element -- served by our own shop-checked handler */}
          {hasLogo ? <img src={`/api/settings/logo?v=${logoVersion ?? ""}`} alt="The shop's logo" className="max-h-full max-w-full object-contain" data-testid="logo-preview" /> : <span className="text-caption text-ink-soft">No logo</span>}
        </div>
        <p className="max-w-md text-ink-soft">
          {typesText(LOGO_EXTENSIONS)}, at most {describeBytes(LOGO_MAX_BYTES)} and {LOGO_MAX_SIDE_PX} pixels on each side. It is scaled down and shown in the header of the
          machining record, its PDF and the quote and invoice PDFs.
        </p>
      </div>
      <div className="flex flex-wrap items-end gap-3">
        <div className="w-full min-w-0 max-w-xl">
          <FilePicker label={hasLogo ? "Replace with" : "Picture"} rule={{ extensions: LOGO_EXTENSIONS, maxBytes: LOGO_MAX_BYTES }} chosen={file}
            onChoose={(f) => { setFile(f); setMessage(null); }} testId="logo-file" />
        </div>
        <Button disabled={pending} onClick={() => void upload()} data-testid="logo-upload">{pending ? "Saving…" : hasLogo ? "Replace logo" : "Upload logo"}</Button>
        {hasLogo ? <Button variant="secondary" disabled={pending} onClick={() => void removeLogo()} data-testid="logo-remove">Remove logo</Button> : null}
      </div>
      {message ? <div role="status" aria-live="polite"><Notice tone={message.tone}>{message.text}</Notice></div> : null}
    </div>
  );
}
