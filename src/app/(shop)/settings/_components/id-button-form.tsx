"use client";
import type { ReactNode } from "react";

/** One button that posts one row's id to a settings action (end a session, remove a member...). */
export function IdButtonForm({ action, name, value, pending, className, children }: {
  action: (formData: FormData) => void;
  name: string;
  value: string;
  pending: boolean;
  className: string;
  children: ReactNode;
}) {
  return (
    <form action={action}>
      <input type="hidden" name={name} value={value} />
      <button type="submit" className={className} disabled={pending}>
        {children}
      </button>
    </form>
  );
}
