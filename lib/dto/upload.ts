import type { UploadKind } from "@/models/upload";

export type UploadDto = {
  id: number;
  productionId: number;
  kind: UploadKind;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  widthPx: number | null;
  heightPx: number | null;
  metresPerPixel: number;
  offsetX: number;
  offsetY: number;
  rotationDeg: number;
  opacity: number;
  locked: boolean;
  /** Where the browser fetches the file (the route checks membership). */
  url: string;
  version: number;
  updatedAt: string;
};
