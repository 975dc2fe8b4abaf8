import type { ReactNode } from "react";
import { MooringMark } from "@/components/layout/mooring-mark";
import { Card } from "@/components/ui/card";

export interface AuthPanelProps {
  title: string;
  description?: ReactNode;
  children: ReactNode;
  /** Links under the card, e.g. "No account yet? Create one". */
  footer?: ReactNode;
}

/** The card every sign-in, sign-up and reset page sits in. */
export function AuthPanel({ title, description, children, footer }: AuthPanelProps) {
  return (
    <div className="grid gap-5">
      <Card className="px-6 py-7 sm:px-8">
        <div className="mb-6 grid gap-3">
          <MooringMark className="size-8" />
          <div>
            <h1 className="text-xl font-semibold tracking-tight">{title}</h1>
            {description ? <p className="mt-1 text-sm leading-relaxed text-muted-foreground">{description}</p> : null}
          </div>
        </div>
        {children}
      </Card>
      {footer ? <div className="grid gap-1 text-center text-sm text-muted-foreground">{footer}</div> : null}
    </div>
  );
}
