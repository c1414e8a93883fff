import Link from "next/link";
import { BackplateMark } from "@/components/brand/backplate-mark";
import { PUBLIC_NAV } from "./nav-links";

export function SiteHeader() {
  return (
    <header className="sticky top-0 z-30 border-b border-graphite bg-ink text-paper">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
        <Link href="/" className="flex items-center gap-2.5" aria-label="Backplate home">
          <BackplateMark />
          <span className="font-display text-lg font-bold tracking-tight">Backplate</span>
        </Link>
        <nav aria-label="Main" className="order-3 w-full sm:order-none sm:w-auto">
          <ul className="flex gap-5 overflow-x-auto text-sm text-paper/80">
            {PUBLIC_NAV.map((link) => (
              <li key={link.href}>
                <Link href={link.href} className="whitespace-nowrap hover:text-brass-light">
                  {link.label}
                </Link>
              </li>
            ))}
          </ul>
        </nav>
      </div>
    </header>
  );
}
