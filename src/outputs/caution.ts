/**
 * The caution every output carries: each sheet the pane, the command line or the demo writes,
 * each command-line summary and the pane itself.
 */
export const CAUTION = 'Results are estimates by published methods; design decisions need a qualified engineer and the local energy code.';
