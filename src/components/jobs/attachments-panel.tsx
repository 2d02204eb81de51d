"use client";
import { useJobActions } from "./job-actions";
import { useRef, useState } from "react";
import { newClientId } from "@/shared/client-id";
import { Button } from "@/components/ui/button";
import { Confirm } from "@/components/ui/confirm";
import { Card } from "@/components/ui/card";
import { inputClass } from "@/components/ui/field";
import { FilePicker } from "@/components/ui/file-picker";
import { ATTACHMENT_EXTENSIONS } from "@/shared/uploads/file-rules";
import { Notice } from "@/components/ui/notice";
import type { JobDetail } from "@/server/jobs/detail";
import { sendForm } from "./api";
import { AttachmentTile } from "./attachment-tile";

type Attachment = JobDetail["attachments"][number];

/** Photos, surface-finish reports and gauge files on the job or a cylinder, with thumbnails. */
export function AttachmentsPanel({ detail, onChanged }: { detail: JobDetail; onChanged: () => void }) {
  const actions = useJobActions();
  const [file, setFile] = useState<File | null>(null);
  // One id per file sent: a retry after a lost answer stores the file once.
  const uploadId = useRef(newClientId());
  const [cylinderId, setCylinderId] = useState("");
  const [message, setMessage] = useState<{ tone: "stop" | "pass"; text: string } | null>(null);
  const [pending, setPending] = useState(false);
  const cylinderNumber = (id: string | null) => detail.cylinders.find((c) => c.id === id)?.number;

  async function upload() {
    if (!file) return setMessage({ tone: "stop", text: "Choose a file first." });
    const form = new FormData();
    form.append("file", file);
    if (cylinderId) form.append("cylinderId", cylinderId);
    form.append("clientId", uploadId.current);
    setPending(true);
    const result = await sendForm<{ displayName: string }>(`/api/jobs/${detail.job.id}/attachments`, form);
    setPending(false);
    if (!result.ok) return setMessage({ tone: "stop", text: result.error.message });
    uploadId.current = newClientId();
    setMessage({ tone: "pass", text: `${result.data.displayName} attached.` });
    setFile(null);
    onChanged();
  }
  const [removing, setRemoving] = useState<Attachment | null>(null);
  async function remove(id: string) {
    setRemoving(null);
    await actions.deleteAttachment(null, { jobId: detail.job.id, attachmentId: id });
    onChanged();
  }

  return (
    <Card title="Attachments">
      <div className="flex flex-col gap-3" data-testid="attachments">
        {detail.permissions.upload ? (
          <div className="flex flex-wrap items-end gap-3">
            <div className="w-full min-w-0 max-w-xl">
              <FilePicker label="File" rule={{ extensions: ATTACHMENT_EXTENSIONS, maxBytes: detail.uploadMaxBytes }} chosen={file}
                onChoose={(f) => { setFile(f); setMessage(null); }} testId="attachment-file" />
            </div>
            <label className="flex flex-col gap-1">
              <span className="font-semibold">On</span>
              <select className={`${inputClass} w-auto`} value={cylinderId} onChange={(e) => setCylinderId(e.target.value)} data-testid="attachment-target">
                <option value="">The whole job</option>
                {detail.cylinders.map((c) => <option key={c.id} value={c.id}>Cylinder {c.number}</option>)}
              </select>
            </label>
            <Button disabled={pending} onClick={() => void upload()} data-testid="attachment-upload">{pending ? "Uploading…" : "Attach"}</Button>
          </div>
        ) : null}
        {message ? <div role="status" aria-live="polite"><Notice tone={message.tone}>{message.text}</Notice></div> : null}
        {detail.attachments.length === 0 ? <p className="text-ink-soft">No attachments yet.</p> : (
          <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4" data-testid="attachment-list">
            {detail.attachments.map((a) => {
              const n = cylinderNumber(a.cylinderId);
              return <AttachmentTile key={a.id} attachment={a} where={n ? `cyl. ${n}` : "job"} onRemove={detail.permissions.upload ? () => setRemoving(a) : undefined} />;
            })}
          </ul>
        )}
        {removing ? (
          <Confirm question={`Remove ${removing.displayName}?`} consequence="The file leaves the job and its cylinder for everyone. This cannot be undone."
            yes="Yes, remove" danger onYes={() => void remove(removing.id)} onNo={() => setRemoving(null)} testId="confirm-remove-attachment" />
        ) : null}
      </div>
    </Card>
  );
}
