import { LandingDemo } from "@/components/designer/landing-demo";
import { PageContainer } from "@/components/layout/page-container";
import { ButtonLink } from "@/components/ui/button";
import { landingDemoConfiguration } from "@/lib/demo-configurations";
import { getCurrentUser } from "@/lib/server/session";

export default async function LandingPage() {
  const user = await getCurrentUser();
  return (
    <PageContainer className="grid gap-10">
      <section className="grid max-w-3xl gap-4">
        <p className="text-xs font-medium text-muted-foreground">A workbench for parallel D-branes</p>
        <h1 className="text-3xl font-semibold tracking-tight text-balance sm:text-4xl">
          Sketch stacks of branes, read off the open-string spectrum as you draw.
        </h1>
        <p className="text-muted-foreground">
          Set Neumann or Dirichlet per axis, move stacks apart, and Mooring classifies every sector, applies the GSO projection, counts
          states with their Chan-Paton factors and marks tachyons and supersymmetry. Every save is a revision your collaborators can fork.
        </p>
        <div className="flex flex-wrap gap-2">
          {user ? (
            <ButtonLink href="/dashboard">Open your dashboard</ButtonLink>
          ) : (
            <>
              <ButtonLink href="/sign-up">Create an account</ButtonLink>
              <ButtonLink href="/sign-in" variant="secondary">
                Sign in
              </ButtonLink>
            </>
          )}
        </div>
      </section>
      <LandingDemo configuration={landingDemoConfiguration} />
    </PageContainer>
  );
}
