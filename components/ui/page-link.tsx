/**
 * A link to a page rendered per request (a workspace's designs, a design, the inbox). Next.js prefetches every
 * link in view, and a prefetch of such a page costs the server about a page's render: the designs list with four
 * rows and the signed-in header sent 16 prefetches and cost the server 270–470 ms of CPU on every load, against
 * about 12 ms for the list page and its API call (the server's CPU time read around a reload on the 2-core machine;
 * DEVELOPERS.md, "Links"). These links fetch on click instead: one render, which the person was waiting for anyway.
 */
import Link from "next/link";
import type { ComponentProps } from "react";

export function PageLink(props: Omit<ComponentProps<typeof Link>, "prefetch">) {
  return <Link {...props} prefetch={false} />;
}
