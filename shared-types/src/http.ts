/** `GET /api/health`. */
export interface HealthResponse {
  status: 'ok';
}

/** The body of every 4xx answer. `message` names the field (and row, for tables). */
export interface ApiErrorBody {
  statusCode: number;
  message: string[] | string;
  error?: string;
}
