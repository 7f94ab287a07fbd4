import { expireOccupancy } from "@/lib/catalog/expire";
import { parseJson, route } from "@/lib/http/route";
import { answerFromLink } from "@/lib/roost-reports/link-answers";
import { linkAnswerSchema } from "@/lib/roost-reports/report-input";

// The confirmation page's button: public, the signed token is the authority. A route rather than a
// server action: an action that expires a cached tag re-renders the page it was called from, and
// this page, rendered again, would find its one-use link spent and hide the thank-you.
export const POST = route({ public: true }, async ({ request }) => {
  const input = await parseJson(request, linkAnswerSchema);
  const answered = await answerFromLink({ input });
  expireOccupancy("route");
  return answered;
});
