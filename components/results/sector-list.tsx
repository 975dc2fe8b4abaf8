"use client";

import { useInfiniteQuery } from "@tanstack/react-query";
import { useWindowVirtualizer } from "@tanstack/react-virtual";
import { useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import type { SectorKind } from "@/lib/boundary/types";
import { configurationQueries, type SectorOverviewPageJson } from "@/lib/client/configurations";
import { pairKey, type SectorNames, type SectorOverview } from "@/lib/spectrum";
import { SectorCard } from "./sector-card";

export interface SectorListProps {
  configurationId: string;
  revisionId: string;
  /** Server-side filter: stack id or label, and tachyonic sectors only. */
  filter: { search: string; tachyonicOnly: boolean };
  /** The unfiltered first page, sent with the page. */
  firstPage: SectorOverviewPageJson;
  typeTwo: boolean;
  kind: SectorKind | "all";
  /** Rows with alpha' M^2 at zero separation (N + a) up to this value are listed. */
  massCap: number;
  showGeV: boolean;
  /** The revision's stack names (the server already sends the sectors in their natural order). */
  names: SectorNames;
}

/** Up to this many sectors start open; a longer list starts closed. */
const openByDefault = 6;

/**
 * The sectors of a result as a virtualised list against the window's scroll. Sector overviews
 * arrive a page at a time, filtered on the server, as the list scrolls towards them; only the cards
 * near the viewport are in the page, each measured as it renders; a card loads its own detail
 * when it is opened. Two thousand sectors scroll as smoothly as ten.
 */
export function SectorList({ configurationId, revisionId, filter, firstPage, typeTwo, kind, massCap, showGeV, names }: SectorListProps) {
  const unfiltered = filter.search === "" && !filter.tachyonicOnly;
  const pages = useInfiniteQuery({
    ...configurationQueries.resultSectorPages(configurationId, revisionId, filter),
    initialData: unfiltered ? { pages: [firstPage], pageParams: [0] } : undefined,
  });
  const sectors = useMemo(() => pages.data?.pages.flatMap((page) => page.items) ?? [], [pages.data]);
  const total = pages.data?.pages[0]?.total ?? 0;
  const listRef = useRef<HTMLDivElement>(null);
  const [offset, setOffset] = useState(0);
  const [toggled, setToggled] = useState<Map<string, boolean>>(() => new Map());
  useLayoutEffect(() => {
    setOffset(listRef.current ? listRef.current.getBoundingClientRect().top + window.scrollY : 0);
  }, []);
  const virtualizer = useWindowVirtualizer({
    count: total,
    estimateSize: () => 52,
    overscan: 6,
    scrollMargin: offset,
    // Rendered on the server too: the first cards are in the HTML before the page hydrates.
    initialRect: { width: 1024, height: 900 },
    getItemKey: (index) => {
      const sector = sectors[index];
      return sector ? pairKey(...sector.pair) : `pending-${index}`;
    },
  });
  const items = virtualizer.getVirtualItems();
  const lastIndex = items.at(-1)?.index ?? 0;
  useEffect(() => {
    if (lastIndex >= sectors.length - 1 && pages.hasNextPage && !pages.isFetchingNextPage) void pages.fetchNextPage();
  }, [lastIndex, sectors.length, pages]);

  if (pages.isPending) return <p className="text-sm text-muted-foreground" role="status">Finding the matching sectors&hellip;</p>;
  if (pages.isError) {
    return (
      <p className="text-sm text-danger-soft-foreground" role="alert">
        The sectors could not be loaded ({pages.error.message}).{" "}
        <button type="button" className="underline" onClick={() => void pages.refetch()}>
          Try again
        </button>
      </p>
    );
  }
  if (total === 0) return <p className="text-sm text-muted-foreground">No sector matches the filters.</p>;
  const isOpen = (sector: SectorOverview) => toggled.get(pairKey(...sector.pair)) ?? total <= openByDefault;

  return (
    <div ref={listRef} className="relative w-full" style={{ height: virtualizer.getTotalSize() }} aria-busy={pages.isFetchingNextPage}>
      {items.map((item) => {
        const sector = sectors[item.index];
        return (
          <div
            key={item.key}
            ref={virtualizer.measureElement}
            data-index={item.index}
            className="absolute top-0 left-0 w-full pb-3"
            style={{ transform: `translateY(${item.start - virtualizer.options.scrollMargin}px)` }}
          >
            {sector ? (
              <SectorCard
                configurationId={configurationId}
                revisionId={revisionId}
                sector={sector}
                open={isOpen(sector)}
                onToggle={(open) =>
                  setToggled((previous) => (previous.get(pairKey(...sector.pair)) === open ? previous : new Map(previous).set(pairKey(...sector.pair), open)))
                }
                typeTwo={typeTwo}
                kind={kind}
                massCap={massCap}
                showGeV={showGeV}
                names={names}
              />
            ) : (
              <div className="h-10 animate-pulse rounded-lg border border-border bg-border/40" aria-hidden />
            )}
          </div>
        );
      })}
    </div>
  );
}
