"use client";

import { DropdownMenu, DropdownMenuItem, DropdownMenuLabel, DropdownMenuSeparator } from "@/components/ui/dropdown-menu";

export type ExportFormat = "json" | "csv" | "tex" | "potential";

export interface ExportMenuProps {
  configurationId: string;
  /**
   * Saves the canvas as PNG (the designer's stage owns the pixels). When absent, the PNG item
   * is not shown, e.g. on pages without a canvas.
   */
  onExportPng?: () => void;
  /** Export a specific revision instead of the current one. */
  revisionId?: string;
}

const formats: ReadonlyArray<{ format: ExportFormat; label: string; hint: string }> = [
  { format: "json", label: "Configuration (JSON)", hint: "re-importable file" },
  { format: "csv", label: "Spectrum (CSV)", hint: "one row per level" },
  { format: "tex", label: "Spectrum (LaTeX table)", hint: "booktabs" },
  { format: "potential", label: "Interaction potentials V(y) (CSV)", hint: "200 samples per pair" },
];

/** The URL of a server-side export; the response carries Content-Disposition: attachment. */
export function exportUrl(configurationId: string, format: ExportFormat, revisionId?: string): string {
  const params = new URLSearchParams({ format });
  if (revisionId) params.set("revision", revisionId);
  return `/api/configurations/${configurationId}/export?${params.toString()}`;
}

/**
 * Export choices for a configuration. File exports are plain downloads (the browser keeps the page);
 * the PNG item calls back into the canvas.
 */
export function ExportMenu({ configurationId, onExportPng, revisionId }: ExportMenuProps) {
  return (
    <DropdownMenu
      trigger={<span>Export</span>}
      triggerClassName="h-9 border border-border-strong bg-surface px-3 font-medium"
    >
      <DropdownMenuLabel>Download</DropdownMenuLabel>
      {formats.map(({ format, label, hint }) => (
        <DropdownMenuItem key={format} onSelect={() => window.location.assign(exportUrl(configurationId, format, revisionId))}>
          <span className="flex-1">{label}</span>
          <span className="text-xs text-muted-foreground">{hint}</span>
        </DropdownMenuItem>
      ))}
      {onExportPng ? (
        <>
          <DropdownMenuSeparator />
          <DropdownMenuItem onSelect={onExportPng}>
            <span className="flex-1">Canvas (PNG)</span>
            <span className="text-xs text-muted-foreground">as drawn</span>
          </DropdownMenuItem>
        </>
      ) : null}
    </DropdownMenu>
  );
}
