import { PageSkeleton } from "@/components/ui/page-skeleton";

export default function Loading() {
  return <PageSkeleton what="the project" blocks={["table", "panel", "table"]} aside />;
}
