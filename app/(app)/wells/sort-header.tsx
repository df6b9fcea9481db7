import Link from "next/link";
import type { WellFilter } from "@/lib/validations/well";
import { wellListHref } from "./list-params";

type SortKey = WellFilter["sort"];

/** A column header that sorts the register through the URL (no client script). */
export function SortHeader({ label, sortKey, filter }: { label: string; sortKey: SortKey; filter: WellFilter }) {
  const isActive = filter.sort === sortKey;
  const nextDir = isActive && filter.dir === "asc" ? "desc" : "asc";
  const ariaSort = isActive ? (filter.dir === "asc" ? "ascending" : "descending") : "none";
  return (
    <th scope="col" aria-sort={ariaSort}>
      <Link
        href={wellListHref({ ...filter, sort: sortKey, dir: nextDir })}
        className={`inline-flex items-center gap-1 hover:text-ink ${isActive ? "text-ink" : ""}`}
        data-testid={`sort-${sortKey}`}
      >
        {label}
        <span aria-hidden="true" className="text-[10px]">{isActive ? (filter.dir === "asc" ? "▲" : "▼") : "↕"}</span>
      </Link>
    </th>
  );
}
