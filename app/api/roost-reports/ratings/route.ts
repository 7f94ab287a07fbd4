import { route } from "@/lib/http/route";
import { getRatingOccupancy } from "@/lib/roost-reports/queries";


// Public: how houses on sites with each placement rating fared. Counts only, never a site.
export const GET = route({ public: true }, async () => getRatingOccupancy());
