"use client";
import { useActionState } from "react";
import { buttonClass } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { endSessionAction } from "../actions";
import { IdButtonForm } from "./id-button-form";
import { dateTimeText } from "@/shared/time";

type SessionItem = { ref: string; signedInAt: string; expiresAt: string; userAgent: string; current: boolean };


/** A rough, readable name for a browser from its user agent (for recognising one's own devices). */
function deviceName(userAgent: string): string {
  if (!userAgent) return "Unknown browser";
  const os = /Android/.test(userAgent) ? "Android" : /iPad|iPhone/.test(userAgent) ? "iOS" : /Windows/.test(userAgent) ? "Windows" : /Mac OS/.test(userAgent) ? "macOS" : /Linux/.test(userAgent) ? "Linux" : "";
  const browser = /Edg\//.test(userAgent) ? "Edge" : /Firefox\//.test(userAgent) ? "Firefox" : /Chrom(e|ium)\//.test(userAgent) ? "Chromium-based browser" : /Safari\//.test(userAgent) ? "Safari" : "Browser";
  return os ? `${browser} on ${os}` : browser;
}

export function SessionList({ sessions, timeZone }: { sessions: SessionItem[]; timeZone: string }) {
  const [state, action, pending] = useActionState(endSessionAction, null);
  return (
    <div className="flex flex-col gap-2">
      <ul className="divide-y divide-rule" data-testid="session-list">
        {sessions.map((s) => (
          <li key={s.ref} className="flex flex-wrap items-center gap-3 py-2" data-testid="session-row">
            <div className="min-w-0 flex-1">
              <p className="font-semibold">
                {deviceName(s.userAgent)} {s.current ? <span className="ml-1 rounded bg-pass-light px-2 py-0.5 text-caption text-pass">This browser</span> : null}
              </p>
              <p className="text-caption text-ink-soft">
                Signed in <span className="num">{dateTimeText(s.signedInAt, timeZone)}</span> · ends if idle until <span className="num">{dateTimeText(s.expiresAt, timeZone)}</span>
              </p>
            </div>
            {s.current ? null : (
              <IdButtonForm action={action} name="sessionRef" value={s.ref} pending={pending} className={buttonClass("secondary")}>
                End session
              </IdButtonForm>
            )}
          </li>
        ))}
      </ul>
      <FormMessage state={state} />
    </div>
  );
}
