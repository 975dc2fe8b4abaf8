"use client";

import { Dialog } from "@/components/ui/dialog";
import { Button } from "@/components/ui/button";

/** Keyboard shortcuts of the designer, as listed in the help sheet. */
export const designerShortcuts: Array<{ keys: string; action: string }> = [
  { keys: "Arrow keys", action: "Move the selected stacks one grid step on the display axes (Shift: four steps; canvas focused)" },
  { keys: "A", action: "Add a stack at the centre of the view" },
  { keys: "D", action: "Duplicate the selected stacks" },
  { keys: "M", action: "Move the worldvolume of the one selected stack to another axis (keeps p)" },
  { keys: "Delete / Backspace", action: "Delete the selected stacks" },
  { keys: "Ctrl/Cmd + A", action: "Select every stack" },
  { keys: "Escape", action: "Clear the selection" },
  { keys: "Ctrl/Cmd + Z", action: "Undo" },
  { keys: "Ctrl/Cmd + Shift + Z, Ctrl + Y", action: "Redo" },
  { keys: "+ / -", action: "Zoom in / out" },
  { keys: "0", action: "Fit the configuration in the view" },
  { keys: "G", action: "Snapping to the grid on / off" },
  { keys: "H / V", action: "Pan tool / select tool (or drag with Alt or the middle button)" },
  { keys: "Ctrl/Cmd + S", action: "Save a revision" },
  { keys: "?", action: "Show this help" },
];

export interface ShortcutHelpDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
}

/** The help sheet listing every designer shortcut. */
export function ShortcutHelpDialog({ open, onOpenChange }: ShortcutHelpDialogProps) {
  return (
    <Dialog
      open={open}
      onOpenChange={onOpenChange}
      title="Keyboard shortcuts"
      description="Shortcuts work when the focus is not in a text field. Everything is also reachable through the boundary grid."
      className="w-[min(40rem,calc(100vw-2rem))]"
      footer={<Button onClick={() => onOpenChange(false)}>Close</Button>}
    >
      <table className="w-full text-sm">
        <tbody>
          {designerShortcuts.map((shortcut) => (
            <tr key={shortcut.keys} className="border-b border-border last:border-0">
              <th scope="row" className="py-1.5 pr-4 text-left align-top font-mono text-xs font-medium whitespace-nowrap">
                {shortcut.keys}
              </th>
              <td className="py-1.5 text-muted-foreground">{shortcut.action}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </Dialog>
  );
}
