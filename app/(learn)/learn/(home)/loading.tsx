import { PageLoading } from "@/components/shell/page-loading";

export default PageLoading;
