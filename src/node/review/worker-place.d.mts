/** The check thread's entry module (worker-place.mjs). */
export function checkWorkerUrl(): URL;
