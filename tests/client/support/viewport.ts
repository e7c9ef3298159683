interface HappyDomWindow {
  happyDOM?: { setViewport(viewport: { width: number; height: number }): void | Promise<void> };
}

/** Resizes the happy-dom window so media queries (and so the phone layout) follow. */
export async function setViewport(width: number, height: number): Promise<void> {
  await (window as Window & HappyDomWindow).happyDOM?.setViewport({ width, height });
}
