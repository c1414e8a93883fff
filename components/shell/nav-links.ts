/** The header's navigation. Later pages add themselves here. */
export interface NavLink {
  href: string;
  label: string;
}

export const PUBLIC_NAV: NavLink[] = [
  { href: "/#bench", label: "Bench" },
  { href: "/#figures", label: "Figures" },
  { href: "/#reviews", label: "Reviews" },
  { href: "/#safety", label: "Safety" },
];
