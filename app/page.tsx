import Link from "next/link";
import { CAUTION } from "@/lib/caution";

export default function HomePage() {
  return (
    <main className="mx-auto flex min-h-screen max-w-5xl flex-col px-6 py-10">
      <header className="flex items-center justify-between">
        <span className="flex items-center gap-3 text-lg font-semibold tracking-tight">
          <ColumnGlyph />
          Caryatid
        </span>
        <Link href="/sign-in" className="btn-quiet">
          Sign in
        </Link>
      </header>

      <section className="mt-20 grid gap-10 md:grid-cols-[3fr_2fr] md:items-center">
        <div>
          <h1 className="text-4xl font-semibold leading-tight tracking-tight text-ink-900 md:text-5xl">
            Caryatid
          </h1>
          <p className="mt-4 text-xl text-ink-700">
            Find the least-cost concrete columns that still pass ACI 318-19 once slenderness is counted — then
            compare, adopt and hand over every one.
          </p>
          <p className="mt-4 text-ink-500">
            Check each column mark with the moment magnifier (k ℓu/r, EI, Pc, Cm, δ, Mc), search sections, bars,
            concrete strengths and intermediate braces for the cheapest design that passes, and keep a traceable
            record of the alternative each mark adopted.
          </p>
          <div className="mt-8 flex gap-3">
            <Link href="/sign-in" className="btn-primary">
              Sign in to your workspace
            </Link>
          </div>
        </div>
        <ol className="panel space-y-3 text-sm text-ink-700">
          <li><strong className="text-ink-900">1 · Marks and loads</strong> — unbraced lengths, restraint, load combinations by form or CSV.</li>
          <li><strong className="text-ink-900">2 · Check</strong> — interaction diagram with first-order and magnified points, clause by clause.</li>
          <li><strong className="text-ink-900">3 · Search</strong> — the cost-versus-utilization front, with a carbon view.</li>
          <li><strong className="text-ink-900">4 · Adopt</strong> — estimators propose, engineers approve; schedules and calculation packages follow.</li>
        </ol>
      </section>

      <footer className="mt-auto pt-16 text-xs text-ink-500">{CAUTION}</footer>
    </main>
  );
}

function ColumnGlyph() {
  return (
    <svg aria-hidden width="22" height="22" viewBox="0 0 22 22" className="text-oxide-600">
      <rect x="3" y="2" width="16" height="3" fill="currentColor" />
      <rect x="6" y="5" width="10" height="12" fill="none" stroke="currentColor" strokeWidth="2" />
      <rect x="3" y="17" width="16" height="3" fill="currentColor" />
    </svg>
  );
}
