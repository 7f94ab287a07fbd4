import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PhotoManager } from "@/components/staff/photo-manager";
import { requirePageUser } from "@/lib/auth/guard";
import { getStaffModelBySlug, listModelPhotos } from "@/lib/staff/queries/model";

export const metadata: Metadata = { title: "Model photos" };

export default async function StaffModelPhotosPage({
  params,
}: {
  params: Promise<{ slug: string }>;
}) {
  const { slug } = await params;
  await requirePageUser("staff:models", `/staff/models/${slug}/photos`);
  const model = await getStaffModelBySlug({ slug });
  if (!model) notFound();
  const photos = await listModelPhotos({ modelId: model.row.id });
  return (
    <PhotoManager
      slug={slug}
      modelId={model.row.id}
      modelName={model.row.name}
      initialPhotos={photos}
    />
  );
}
