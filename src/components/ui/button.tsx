import type { ButtonHTMLAttributes } from "react";

type Variant = "primary" | "secondary" | "danger" | "ghost";

const VARIANTS: Record<Variant, string> = {
  primary: "bg-steel text-white hover:bg-steel-dark disabled:bg-ink-faint",
  secondary: "border border-rule-strong bg-paper-raised text-ink hover:bg-paper-sunk disabled:border-rule disabled:text-ink-faint disabled:hover:bg-paper-raised",
  danger: "bg-stop text-white hover:brightness-95 disabled:opacity-50 disabled:hover:brightness-100",
  ghost: "text-steel hover:bg-steel-light disabled:text-ink-faint disabled:hover:bg-transparent",
};

export function buttonClass(variant: Variant = "primary", extra = ""): string {
  return `inline-flex min-h-touch items-center justify-center gap-2 rounded-md px-4 font-semibold transition-colors disabled:cursor-not-allowed ${VARIANTS[variant]} ${extra}`;
}

export function Button({ variant = "primary", className = "", ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return <button type="button" className={buttonClass(variant, className)} {...props} />;
}
