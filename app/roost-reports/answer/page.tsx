import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { LinkAnswerForm } from "@/components/roost-reports/link-answer-form";
import { ReportCautions } from "@/components/roost-reports/report-cautions";
import { Alert } from "@/components/ui/alert";
import { ANSWER_WORDS, COUNT_BAND_WORDS } from "@/lib/roost-reports/answers";
import { previewLinkAnswer } from "@/lib/roost-reports/link-answers";

// A private page, opened by its own link or token: rendered per request, and it may wait for its data.
export const instant = false;

// The token is in the URL: keep it out of Referer headers and out of search engines.
export const metadata: Metadata = {
  title: "Your roost report",
  referrer: "no-referrer",
  robots: { index: false, follow: false },
};

// Opening the link changes nothing: mail scanners follow links, so the answer is recorded only
// when the buyer presses the button (a POST). Each link records its answer once: the same link
// again is refused; the page after an answer offers fresh links to change it.
export default async function LinkAnswerPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { token } = await searchParams;
  const value = typeof token === "string" ? token : "";
  const preview = value ? await previewLinkAnswer({ token: value }) : { ok: false as const, message: "This link is missing its token. Copy the whole link from the e-mail." };
  if (!preview.ok) {
    return (
      <PageShell narrow>
        <PageHeader title={"used" in preview ? "This link has already been used" : "This link cannot record an answer"} />
        <Alert tone="poor" title={"used" in preview ? "Nothing new was recorded" : "Nothing was recorded"}>
          {preview.message}
        </Alert>
      </PageShell>
    );
  }
  const chosen = ANSWER_WORDS[preview.claims.answer];
  return (
    <PageShell narrow>
      <PageHeader title={`Summer ${preview.seasonLabel}: ${preview.title}`} lead="Check the answer below, then press the button to record it. No sign-in is needed." />
      <div className="flex flex-col gap-5">
        {preview.current ? (
          <p className="text-ink-soft">
            Your answer now: <span className="font-bold text-ink">{ANSWER_WORDS[preview.current.answer].label}</span>
            {preview.current.countBand ? ` (${COUNT_BAND_WORDS[preview.current.countBand].toLowerCase()})` : ""}.
          </p>
        ) : null}
        <section aria-labelledby="chosen" className="rounded-xl border border-paper-200 bg-white p-5">
          <h2 id="chosen" className="font-display text-xl font-semibold text-moss-900">
            {chosen.label}
          </h2>
          <p className="mt-1 text-ink-soft">{chosen.detail}</p>
          <div className="mt-4">
            <LinkAnswerForm token={value} answer={preview.claims.answer} />
          </div>
        </section>
        <p className="text-sm text-ink-soft">Wrong answer? Use another link in the e-mail: the last one you confirm counts. Each link works once.</p>
        <ReportCautions hemisphere={preview.hemisphere} />
      </div>
    </PageShell>
  );
}
