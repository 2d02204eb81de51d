"use client";
import dynamic from "next/dynamic";

/** The rate chart, fetched only where it is drawn. */
export const RateChartLazy = dynamic(() => import("./rate-chart"), {
  ssr: false,
  loading: () => <div className="h-64 w-full animate-pulse rounded bg-paper-sunk" aria-label="Loading the chart" />,
});
