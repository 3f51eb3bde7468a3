import type { ReactNode } from "react";
import { ProductMark } from "@/components/app-shell/product-mark";
import { CAUTION } from "@/lib/caution";

export interface AuthFrameProps {
  title: string;
  lead?: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}

/** The calm single-column frame of the signed-out pages: mark, heading, one panel, caution. */
export function AuthFrame({ title, lead, children, footer }: AuthFrameProps) {
  return (
    <div className="flex min-h-screen flex-col bg-stone-25">
      <header className="mx-auto w-full max-w-5xl px-6 py-6">
        <ProductMark />
      </header>
      <main className="mx-auto w-full max-w-md flex-1 px-6 pb-12 pt-6">
        <h1 className="text-2xl font-semibold tracking-tight text-ink-900">{title}</h1>
        {lead ? <div className="mt-2 text-sm text-ink-500">{lead}</div> : null}
        <div className="mt-6 space-y-6">{children}</div>
        {footer ? <div className="mt-6 text-sm text-ink-700">{footer}</div> : null}
      </main>
      <footer className="mx-auto w-full max-w-5xl px-6 py-6 text-xs text-ink-500">{CAUTION}</footer>
    </div>
  );
}
