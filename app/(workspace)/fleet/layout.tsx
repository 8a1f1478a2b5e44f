import type { ReactNode } from "react";
import { FleetTabs } from "@/components/fleet/fleet-tabs";

/** Draws the fleet's tabs only: every page checks access itself. */
export default function FleetLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-w-0 flex-col gap-5">
      <FleetTabs />
      {children}
    </div>
  );
}
