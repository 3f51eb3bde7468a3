import Link from "next/link";

export interface ProductMarkProps {
  href?: string;
}

/** The product's name with its column glyph (a capital, a shaft and a base). */
export function ProductMark({ href = "/" }: ProductMarkProps) {
  return (
    <Link href={href} className="flex items-center gap-2 text-base font-semibold tracking-tight text-ink-900">
      <svg aria-hidden width="20" height="20" viewBox="0 0 22 22" className="text-oxide-600">
        <rect x="3" y="2" width="16" height="3" fill="currentColor" />
        <rect x="6" y="5" width="10" height="12" fill="none" stroke="currentColor" strokeWidth="2" />
        <rect x="3" y="17" width="16" height="3" fill="currentColor" />
      </svg>
      Caryatid
    </Link>
  );
}
