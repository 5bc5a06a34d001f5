/** Who is looking, passed in by the app layer (features do not import each other). */
export interface PerilViewer {
  userId: string | null;
  canWrite: boolean;
}
