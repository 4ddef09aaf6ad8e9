/** The project last worked in, remembered in this browser so project-scoped links have a target. */
const KEY = 'panelpoint.project';

export function rememberedProject(): string | undefined {
  try {
    return window.localStorage.getItem(KEY) ?? undefined;
  } catch {
    return undefined;
  }
}

export function rememberProject(slug: string): void {
  try {
    window.localStorage.setItem(KEY, slug);
  } catch {
    // Private windows may refuse storage: the links then fall back to the project list.
  }
}
