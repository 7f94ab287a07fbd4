import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader, PageShell } from "@/components/page-header";
import { ModelForm } from "@/components/staff/model-form";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "List a new model" };

export default async function NewModelPage() {
  await requirePageUser("staff:models", "/staff/models/new");
  return (
    <PageShell>
      <p className="mb-3 text-sm">
        <Link href="/staff/models" className="font-bold text-moss-800 underline">
          ← All models
        </Link>
      </p>
      <PageHeader
        title="List a new model"
        lead="Type the builder's specs and watch the design check beside each field. A new model is saved as a draft; it goes on sale once a built unit passes inspection."
      />
      <ModelForm />
    </PageShell>
  );
}
