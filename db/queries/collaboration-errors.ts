import { DomainError } from "../../lib/errors";

/**
 * A request that conflicts with the current state of a collaboration record (409), e.g. an
 * expired invitation or removing a group's last owner. `code` says which rule was hit.
 */
export class CollaborationConflictError extends DomainError {
  readonly status = 409;
  constructor(
    readonly code:
      | "invitation_expired"
      | "invitation_revoked"
      | "invitation_used"
      | "invitation_wrong_account"
      | "account_exists"
      | "last_owner"
      | "already_member"
      | "personal_group",
    message: string,
  ) {
    super(message);
    this.name = "CollaborationConflictError";
  }
}
