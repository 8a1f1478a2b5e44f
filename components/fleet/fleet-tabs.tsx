"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { cn } from "@/components/ui";

const TABS = [
  { href: "/fleet", label: "Overview", exact: true },
  { href: "/fleet/vehicles", label: "Vehicles" },
  { href: "/fleet/trailers", label: "Trailers" },
  { href: "/fleet/accessories", label: "Accessories" },
  { href: "/fleet/matrix", label: "Pairings" },
  { href: "/fleet/import", label: "Import" },
];

/** The fleet's sections; scrolls within itself on a phone rather than pushing the page sideways. */
export function FleetTabs() {
  const pathname = usePathname();
  return (
    <nav aria-label="Fleet sections" className="-mx-1 overflow-x-auto">
      <ul className="flex min-w-max gap-1 border-b border-rule px-1">
        {TABS.map((tab) => {
          const active = tab.exact ? pathname === tab.href : pathname === tab.href || pathname.startsWith(`${tab.href}/`);
          return (
            <li key={tab.href}>
              <Link
                href={tab.href}
                aria-current={active ? "page" : undefined}
                className={cn(
                  "inline-flex h-10 items-center border-b-2 px-3 text-sm font-medium whitespace-nowrap",
                  active ? "border-accent text-ink" : "border-transparent text-ink-soft hover:text-ink",
                )}
              >
                {tab.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
