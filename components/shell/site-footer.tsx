import { BackplateMark } from "@/components/brand/backplate-mark";

export function SiteFooter() {
  return (
    <footer className="border-t border-rule bg-paper-deep text-ink-soft">
      <div className="mx-auto flex max-w-6xl flex-col gap-4 px-4 py-8 text-sm sm:flex-row sm:items-start sm:justify-between sm:px-6">
        <div className="flex items-center gap-2">
          <BackplateMark className="h-5 w-5" />
          <span className="font-display font-bold text-ink">Backplate</span>
          <span>· front ends signed off before the first prototype</span>
        </div>
        <p className="max-w-md">
          Simulation is not a safety assessment. Valve and polarisation supplies can kill; follow local electrical
          codes and qualified practice.
        </p>
      </div>
    </footer>
  );
}
