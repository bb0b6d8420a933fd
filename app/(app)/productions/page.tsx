import type { Metadata } from "next";
import { HydrationBoundary, dehydrate } from "@tanstack/react-query";
import { userForPage } from "@/lib/auth/page-guards";
import { getProductionsByUser } from "@/lib/data/productions";
import { makeQueryClient } from "@/lib/query/query-client";
import { productionKeys } from "@/hooks/query-keys";
import { ProductionList } from "./production-list";
import { NewProductionForm } from "./new-production-form";

export const metadata: Metadata = { title: "Productions" };

export default async function ProductionsPage() {
  const user = await userForPage();
  const queryClient = makeQueryClient();
  await queryClient.prefetchQuery({
    queryKey: productionKeys.list(),
    queryFn: () => getProductionsByUser({ userId: user.id }),
  });
  return (
    <main className="mx-auto flex max-w-5xl flex-col gap-6 px-4 py-6">
      <h1 className="text-2xl font-semibold">Your productions</h1>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <ProductionList />
        <NewProductionForm />
      </HydrationBoundary>
    </main>
  );
}
