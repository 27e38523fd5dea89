/**
 * The task pane. Placeholder entry until the pane issue lands: it only shows the caution.
 */
export function startPane(doc: Document): void {
  const root = doc.getElementById('sunpane-root');
  if (root) root.textContent = 'Sunpane results are estimates by published methods; design decisions need a qualified engineer and the local energy code.';
}
