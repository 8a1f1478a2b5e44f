import type { ReactNode } from "react";
import { Card, CardBody } from "@/components/ui";

/** The narrow card every sign-in style page sits in. */
export function AuthPanel({ title, intro, children, footer }: { title: string; intro?: ReactNode; children?: ReactNode; footer?: ReactNode }) {
  return (
    <div className="mx-auto w-full max-w-md px-4 py-10 sm:py-16">
      <Card>
        <CardBody className="flex flex-col gap-5 p-6 sm:p-8">
          <div>
            <h1 className="text-2xl font-semibold tracking-tight text-ink">{title}</h1>
            {intro ? <p className="mt-1.5 text-[0.9375rem] leading-relaxed text-ink-soft">{intro}</p> : null}
          </div>
          {children}
        </CardBody>
      </Card>
      {footer ? <div className="mt-5 text-center text-sm text-ink-soft">{footer}</div> : null}
    </div>
  );
}
