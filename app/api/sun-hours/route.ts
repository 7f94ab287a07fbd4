import { parseQuery, route } from "@/lib/http/route";
import { sunHoursQuerySchema } from "@/lib/placement/schema";
import { describeSunHours } from "@/lib/placement/sun-hours-answer";


// Public: hours of direct sun on a face for one day (or, without a date, the season mean).
export const GET = route({ public: true }, async ({ request }) =>
  describeSunHours(parseQuery(request, sunHoursQuerySchema)),
);
