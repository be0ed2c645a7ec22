/** The plots the workbench draws as it checks: the horse-load envelope and the turn-speed plot (the report has them all). */
export const LIVE_PLOTS: readonly string[] = ['yoke-load', 'turn-speed'];
