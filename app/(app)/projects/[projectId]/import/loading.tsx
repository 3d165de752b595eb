import { PageSkeleton } from "@/components/ui/page-skeleton";

export default function Loading() {
  return <PageSkeleton what="the import" blocks={["panel", "table"]} />;
}
