// Our mark: a bore in section with the crosshatch drawn at 45° included, the product's default.
export function BrandMark({ size = 32 }: { size?: number }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden="true">
      <rect x="3" y="3" width="26" height="26" rx="5" className="fill-steel" />
      <rect x="9" y="6" width="14" height="20" rx="1.5" className="fill-paper-raised" />
      <path d="M9 22 L17 14 M9 14 L17 22 M15 22 L23 14 M15 14 L23 22 M9 16 L14 11 M18 11 L23 16" className="stroke-steel" strokeWidth="1.2" />
    </svg>
  );
}
