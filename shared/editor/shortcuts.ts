/** Editor commands that have a key. */
export type CommandId =
  | 'undo' | 'redo' | 'selectAll' | 'nextPart' | 'prevPart' | 'delete' | 'duplicate' | 'rotate90' | 'mirrorX' | 'mirrorY' | 'fit' | 'escape' | 'help'
  | 'nudgeLeft' | 'nudgeRight' | 'nudgeUp' | 'nudgeDown' | 'toolPick' | 'toolOutline' | 'toolBox' | 'toolRound' | 'toolTube'

/** One row of the shortcut sheet: the keys as shown and what they do. */
export interface Shortcut {
  id: CommandId
  keys: string
  does: string
}

/** Every shortcut, in the order the sheet lists them. */
export const SHORTCUTS: readonly Shortcut[] = [
  { id: 'undo', keys: 'Ctrl+Z', does: 'Undo' },
  { id: 'redo', keys: 'Ctrl+Shift+Z or Ctrl+Y', does: 'Redo' },
  { id: 'selectAll', keys: 'Ctrl+A', does: 'Select every part' },
  { id: 'nextPart', keys: '] or [', does: 'Select the next or previous part (then arrows nudge it, and the Vertices panel types its corners)' },
  { id: 'delete', keys: 'Delete or Backspace', does: 'Delete the selected vertex, or else the selected parts' },
  { id: 'duplicate', keys: 'Ctrl+D', does: 'Duplicate the selected parts' },
  { id: 'rotate90', keys: 'R', does: 'Rotate the selection 90° counter-clockwise' },
  { id: 'mirrorX', keys: 'M', does: 'Mirror the selection left–right' },
  { id: 'mirrorY', keys: 'Shift+M', does: 'Mirror the selection top–bottom' },
  { id: 'fit', keys: 'F', does: 'Zoom to fit the whole section' },
  { id: 'nudgeRight', keys: '← ↑ → ↓', does: 'Nudge the selection (or the selected vertex) by one grid step; with Shift by 1 mm' },
  { id: 'escape', keys: 'Esc', does: 'Cancel the drawing in progress, or clear the selection' },
  { id: 'toolPick', keys: 'V', does: 'Pick tool' },
  { id: 'toolOutline', keys: 'P', does: 'Outline tool (click corners, Enter closes)' },
  { id: 'toolBox', keys: 'B', does: 'Box tool (drag a rectangle)' },
  { id: 'toolRound', keys: 'C', does: 'Round tool (drag from the centre)' },
  { id: 'toolTube', keys: 'T', does: 'Tube tool (drag from the centre)' },
  { id: 'help', keys: '?', does: 'Show or hide this sheet' },
]

/** The key event fields the matcher reads. */
export interface KeyLike {
  key: string
  ctrlKey: boolean
  metaKey: boolean
  shiftKey: boolean
  altKey: boolean
}

/** The command a key press asks for, or null. Ctrl and Cmd are the same. */
export function commandFor(e: KeyLike): CommandId | null {
  const mod = e.ctrlKey || e.metaKey
  const k = e.key.length === 1 ? e.key.toLowerCase() : e.key
  if (mod) {
    if (k === 'z') return e.shiftKey ? 'redo' : 'undo'
    if (k === 'y') return 'redo'
    if (k === 'd') return 'duplicate'
    if (k === 'a') return 'selectAll'
    return null
  }
  if (e.altKey) return null
  switch (k) {
    case 'Delete': case 'Backspace': return 'delete'
    case 'r': return 'rotate90'
    case 'm': return e.shiftKey ? 'mirrorY' : 'mirrorX'
    case 'f': return 'fit'
    case 'Escape': return 'escape'
    case '?': return 'help'
    case ']': return 'nextPart'
    case '[': return 'prevPart'
    case 'ArrowLeft': return 'nudgeLeft'
    case 'ArrowRight': return 'nudgeRight'
    case 'ArrowUp': return 'nudgeUp'
    case 'ArrowDown': return 'nudgeDown'
    case 'v': return 'toolPick'
    case 'p': return 'toolOutline'
    case 'b': return 'toolBox'
    case 'c': return 'toolRound'
    case 't': return 'toolTube'
    default: return null
  }
}
