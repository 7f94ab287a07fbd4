import { vi } from "vitest";

// Integration tests use one migrated database per worker: an in-memory PGlite by default,
// or the PostgreSQL server named by DATABASE_URL (CI runs the suite against both).
process.env.DATABASE_URL ??= "memory://";
process.env.ROOSTWRIGHT_MODE ??= "local";

// Deterministic keys for the payments and mail stand-ins the integration tests start themselves.
process.env.STRIPE_SECRET_KEY ??= "sk_test_integration_key";
process.env.STRIPE_PUBLISHABLE_KEY ??= "pk_test_integration_key";
process.env.STRIPE_WEBHOOK_SECRET ??= "whsec_integration_secret_0123456789";
process.env.STRIPE_API_BASE ??= "http://localhost:12311";
process.env.RESEND_API_KEY ??= "re_integration_key";
process.env.RESEND_BASE_URL ??= "http://localhost:12312";
process.env.NEXTAUTH_SECRET ??= "integration-secret-integration-secret-0123";

// next/cache as a test double for every integration file (tests/support/next-cache.ts).
vi.mock("next/cache", async () => (await import("./next-cache")).nextCacheMock);
