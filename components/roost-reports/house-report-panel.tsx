import type { HouseQuestion } from "@/lib/roost-reports/queries";
import { HouseReportForm } from "./house-report-form";
import { ReportCautions } from "./report-cautions";

/** "Did bats move in?" for every arrived house of one or more orders (order page, account page). */
export function HouseReportPanel({
  questions,
  accessToken,
  headingLevel = 2,
}: {
  questions: HouseQuestion[];
  accessToken?: string;
  headingLevel?: 2 | 3;
}) {
  if (questions.length === 0) return null;
  const Heading = headingLevel === 2 ? "h2" : "h3";
  return (
    <section aria-labelledby="roost-reports" className="flex flex-col gap-4" data-testid="roost-report-panel">
      <Heading id="roost-reports" className="font-display text-2xl font-semibold text-moss-900">
        Did bats move in?
      </Heading>
      <p className="max-w-prose text-ink-soft">
        Tell us once a season what you saw, even if it was nothing. Your answers (never your address) go into the figures we show the next
        buyer for each model. You can change an answer at any time.
      </p>
      <ReportCautions />
      <div className="flex flex-col gap-4">
        {questions.map((q) => (
          <HouseReportForm key={`${q.orderLineId}-${q.unit}`} question={q} orderId={q.orderId} accessToken={accessToken} />
        ))}
      </div>
    </section>
  );
}
