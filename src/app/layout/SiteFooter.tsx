export function SiteFooter() {
  return (
    <footer className="mt-12 border-t border-ink print:hidden">
      <div className="mx-auto flex w-full max-w-sheet flex-wrap items-baseline justify-between gap-x-8 gap-y-2 px-4 py-4 text-sm sm:px-6">
        <p>
          <span aria-hidden="true" className="mr-2">
            ■
          </span>
          <span className="label-caps mr-2 text-ink">Caution</span>
          Skinwright is an aid to — never a substitute for — the licensed professional of record and the local
          code official.
        </p>
        <a href="/api/docs" className="text-ink-muted">
          API reference
        </a>
      </div>
    </footer>
  );
}
