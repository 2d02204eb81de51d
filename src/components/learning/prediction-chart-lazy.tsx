"use client";
import dynamic from "next/dynamic";

/** The predicted-vs-actual chart, fetched only on /runs. */
export const PredictionChartLazy = dynamic(() => import("./prediction-chart"), {
  ssr: false,
  loading: () => <div className="h-72 w-full animate-pulse rounded bg-paper-sunk" aria-label="Loading the chart" />,
});
