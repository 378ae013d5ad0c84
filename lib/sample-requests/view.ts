// What a request for more samples looks like to the lab and to the manufacturer. The client imports
// these types from here, never from queries.ts.

export interface SampleRequestRow {
  id: string;
  submissionId: string;
  round: number;
  count: number;
  weight: string;
  dueBy: string;
  note: string;
  requestedByName: string;
  requestedAt: Date;
  acknowledgedByName: string | null;
  acknowledgedAt: Date | null;
  shippingDetails: string | null;
  shippedOn: string | null;
}

/** The same request as JSON carries it: instants as ISO strings, days as YYYY-MM-DD. */
export type SampleRequest = Omit<SampleRequestRow, "requestedAt" | "acknowledgedAt"> & { requestedAt: string; acknowledgedAt: string | null };
