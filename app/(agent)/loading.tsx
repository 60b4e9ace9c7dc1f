import { AreaLoading } from "@/components/area-loading";

export default function Loading() {
  return <AreaLoading />;
}
