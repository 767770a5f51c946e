/** The pane's elements by id (taskpane.html); a missing one is a build error, thrown at once. */

export function $(id: string): HTMLElement {
  const element = document.getElementById(id);
  if (!element) throw new Error(`pane element #${id} is missing`);
  return element;
}
export const input = (id: string) => $(id) as HTMLInputElement;
export const select = (id: string) => $(id) as HTMLSelectElement;
