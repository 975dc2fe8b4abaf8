/** Largest configuration file accepted by `POST /api/configurations/import`, in bytes (256 KiB). */
export const importMaxBytes = 256 * 1024;
