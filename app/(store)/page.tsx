import Link from "next/link";
import { BandFinder } from "@/components/catalog/band-finder";
import { ButtonLink } from "@/components/ui/button";
import { Suspense } from "react";
import { CenterCityClause, CenterKicker } from "@/components/center-bits";

const STEPS = [
  {
    title: "Know your summers",
    text: "Your July high decides the shade of the house and whether it needs vents. Tell us your ZIP code and we look it up.",
    href: "/climate",
    cta: "Find your climate band",
  },
  {
    title: "Choose a Sound Build house",
    text: "Every house on sale carries our Roostwright Sound Build: built to our roost-design criteria, with a built sample measured by our workshop before it is listed.",
    href: "/houses",
    cta: "Browse the houses",
  },
  {
    title: "Plan where it hangs",
    text: "Height, facing, sun, water nearby: most empty bat houses are empty because of where they hang. Check your spot first.",
    href: "/placement",
    cta: "Check a site",
  },
];

// Prerendered whole; only the center's name and city stream in from its settings.
export default function HomePage() {
  return (
    <div>
      <section className="bg-moss-900 text-paper-50">
        <div className="mx-auto grid max-w-6xl gap-8 px-4 py-14 sm:px-6 md:grid-cols-[1.2fr_1fr] md:items-center">
          <div className="flex flex-col gap-5">
            <Suspense fallback={<p className="h-5" aria-hidden />}>
              <CenterKicker className="text-sm font-bold tracking-wide text-ember-300 uppercase" />
            </Suspense>
            <h1 className="font-display text-4xl font-semibold text-paper-50 sm:text-5xl">Bat houses that bats move into.</h1>
            <p className="max-w-prose text-lg text-paper-200">
              Built by our volunteers, measured by our workshop, matched to your summers, and sent with an install guide
              written for your house and your site. Every sale funds the care of injured and orphaned bats at our
              rescue
              <Suspense fallback={null}>
                <CenterCityClause />
              </Suspense>
              .
            </p>
            <div className="flex flex-wrap gap-3">
              <ButtonLink href="/houses" size="lg">
                Browse the houses
              </ButtonLink>
              <Link href="/give" className="self-center font-bold text-paper-50 underline underline-offset-4">
                Or give to the rescue
              </Link>
            </div>
          </div>
          <div className="text-ink">
            <BandFinder compact />
          </div>
        </div>
      </section>
      <section className="mx-auto max-w-6xl px-4 py-12 sm:px-6" aria-labelledby="how">
        <h2 id="how" className="font-display text-3xl font-semibold text-moss-900">
          Three steps to an occupied house
        </h2>
        <ol className="mt-6 grid gap-6 md:grid-cols-3">
          {STEPS.map((s, i) => (
            <li key={s.href} className="flex flex-col gap-3 rounded-xl border border-paper-200 bg-white p-6 shadow-card">
              <span className="font-display text-2xl font-semibold text-ember-700">{i + 1}</span>
              <h3 className="font-display text-xl font-semibold text-moss-900">{s.title}</h3>
              <p className="text-ink-soft">{s.text}</p>
              <Link href={s.href} className="mt-auto font-bold text-moss-800 underline underline-offset-4">
                {s.cta}
              </Link>
            </li>
          ))}
        </ol>
      </section>
    </div>
  );
}
