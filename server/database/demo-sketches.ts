/** Demo sketches of the Millrace Yard retrofit (filled in by the sketch document work). */
export function demoSketches(): { title: string; project: string; description: string; status: 'draft' | 'submitted' | 'approved'; document: unknown }[] {
  return []
}
