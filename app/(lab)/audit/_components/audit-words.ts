// The record kinds and actions the audit log holds, in words, and where each record is seen.

export const RECORD_KINDS: Record<string, { label: string; href?: (id: string) => string }> = {
  submission: { label: "Submission", href: (id) => `/submissions/${id}` },
  sample: { label: "Sample" },
  run: { label: "Run", href: (id) => `/runs/${id}` },
  clip: { label: "Recording", href: (id) => `/clips/${id}` },
  drop: { label: "Drop", href: (id) => `/drops/${id}` },
  reading: { label: "Reading" },
  ruling: { label: "Ruling" },
  sample_request: { label: "Sample request" },
  specification_edition: { label: "Specification edition", href: (id) => `/editions/${id}` },
  organisation: { label: "Organisation" },
  user: { label: "User" },
};

export const recordLabel = (entity: string) => RECORD_KINDS[entity]?.label ?? entity;

/** Offered in the action box; the log matches what is typed as the start of an action ("reading." is every reading event). */
export const KNOWN_ACTIONS = [
  "submission.created", "submission.updated", "submission.signed_off", "submission.reopened",
  "sample.created", "sample.updated", "sample.deleted", "sample.imported",
  "run.created", "run.updated", "run.accepted",
  "clip.upload_started", "clip.uploaded", "clip.refused",
  "drop.placed", "drop.state_changed",
  "reading.started", "reading.submitted", "reading.discarded", "reading.correction_started", "reading.corrected",
  "ruling.made",
  "sample_request.created", "sample_request.acknowledged",
  "edition.created", "edition.updated",
  "organisation.created", "organisation.updated",
  "user.invited", "user.reinvited", "user.invite_accepted", "user.updated", "user.deactivated", "user.reactivated", "user.notifications_changed",
  "sign_in.succeeded", "sign_in.failed", "sign_in.throttled",
];
