export interface WorkerRequest {
  id: number;
  task: string;
  input: unknown;
}

export type WorkerReply =
  | { id: number; ok: true; result: unknown }
  | { id: number; ok: false; message: string; argument?: string; allowed?: string; hint?: string; defect?: boolean };
