/**
 * Audit-log entries as plain English, for the dashboard's recent activity and a group's audit log:
 * "saved version 3 of", "invited sam@example.org as a viewer". The keys of the log
 * ("configuration.update") stay for programs; people read these.
 *
 * Pure: an entry's action and details in, words out. Invalid-input policy: a detail of the wrong
 * type is left out of the sentence, and an unknown action is spelt out from its key; nothing throws.
 */
import { withArticle } from "@/lib/wording";

/** What an entry says, around the configuration it is about (linked where the page can). */
export interface ActivityPhrase {
  /** Lower-case past-tense words before the configuration ("saved version 3 of"). */
  verb: string;
  /**
   * Whether the configuration's title belongs after `verb`. False for entries about the group
   * or its members ("created the group", "invited ...").
   */
  aboutConfiguration: boolean;
  /** Words after the configuration ("as a starter"), or "". */
  rest: string;
}

/** The part of an audit entry the sentence reads. */
export interface ActivityEntry {
  action: string;
  details: Record<string, unknown>;
}

/**
 * The phrase of one audit entry.
 *
 * @param entry - Its action key and details, as recorded by db/queries.
 * @returns The words around the configuration title; see {@link ActivityPhrase}.
 * @example
 * describeActivity({ action: "configuration.update", details: { version: 3 } })
 * // => { verb: "saved version 3 of", aboutConfiguration: true, rest: "" }
 * describeActivity({ action: "invitation.create", details: { email: "sam@example.org", role: "viewer" } })
 * // => { verb: "invited sam@example.org as a viewer", aboutConfiguration: false, rest: "" }
 */
export function describeActivity(entry: ActivityEntry): ActivityPhrase {
  const d = entry.details;
  const text = (key: string): string | null => (typeof d[key] === "string" && d[key] !== "" ? (d[key] as string) : null);
  const number = (key: string): number | null => (typeof d[key] === "number" ? (d[key] as number) : null);
  const about = (verb: string, rest = ""): ActivityPhrase => ({ verb, aboutConfiguration: true, rest });
  const plain = (verb: string): ActivityPhrase => ({ verb, aboutConfiguration: false, rest: "" });
  const role = (key: string) => {
    const value = text(key);
    return value ? withArticle(value) : null;
  };

  switch (entry.action) {
    case "configuration.create":
      return about("created");
    case "configuration.update": {
      const version = number("version");
      return about(version === null ? "saved a new version of" : `saved version ${version} of`);
    }
    case "configuration.fork":
      return about("created", d.withDraft === true ? "as a fork, with unsaved changes" : "as a fork");
    case "configuration.forked": {
      const title = text("forkTitle");
      return about("forked", title ? `as \u201c${title}\u201d` : "");
    }
    case "configuration.restore": {
      const restored = number("restoredNumber");
      const version = number("version");
      return about(restored === null ? "restored an earlier revision of" : `restored revision ${restored} of`, version === null ? "" : `as version ${version}`);
    }
    case "configuration.delete":
      return about("deleted");
    case "configuration.undelete":
      return about("recovered");
    case "configuration.publish_starter":
      return about("published", "as a starter");
    case "configuration.withdraw_starter":
      return about("withdrew", "from the starters");
    case "comment.create": {
      const revision = number("revisionNumber");
      return about(revision === null ? "commented on" : `commented on revision ${revision} of`);
    }
    case "comment.delete":
      return about("deleted a comment on");
    case "attachment.create":
      return about(`attached ${text("fileName") ?? "a file"} to`);
    case "attachment.delete":
      return about(`removed ${text("fileName") ?? "an attachment"} from`);
    case "share_link.create":
      return about("created a share link to");
    case "share_link.revoke":
      return about("revoked a share link to");
    case "invitation.create": {
      const email = text("email") ?? "someone";
      const as = role("role");
      return plain(as ? `invited ${email} as ${as}` : `invited ${email}`);
    }
    case "invitation.resend":
      return plain(`sent the invitation to ${text("email") ?? "someone"} again`);
    case "invitation.revoke":
      return plain(`withdrew the invitation to ${text("email") ?? "someone"}`);
    case "invitation.accept": {
      if (d.alreadyMember === true) return plain("accepted an invitation while already a member");
      const as = role("role");
      return plain(as ? `accepted an invitation and joined as ${as}` : "accepted an invitation and joined");
    }
    case "membership.role_change": {
      const from = text("from");
      const to = text("to");
      return plain(from && to ? `changed a member's role from ${from} to ${to}` : "changed a member's role");
    }
    case "membership.leave":
      return plain("left the group");
    case "membership.remove": {
      const was = role("role");
      return plain(was ? `removed ${was} from the group` : "removed a member from the group");
    }
    case "group.create":
      return plain("created the group");
    default:
      return plain(entry.action.replace(/[._]+/g, " ").trim());
  }
}

/** Options of {@link activitySentence}. */
export interface ActivitySentenceOptions {
  /** Who did it ("Ada Quayle"); the sentence starts with the verb, capitalised, when left out. */
  actor?: string;
  /** Title of the configuration the entry is about, when it is known. */
  configurationTitle?: string | null;
}

/**
 * One audit entry as a whole sentence, with the configuration's title in quotes.
 *
 * @example
 * activitySentence({ action: "configuration.update", details: { version: 2 } }, { actor: "Ben", configurationTitle: "Probe" })
 * // => "Ben saved version 2 of “Probe”."
 * activitySentence({ action: "group.create", details: {} })
 * // => "Created the group."
 */
export function activitySentence(entry: ActivityEntry, options: ActivitySentenceOptions = {}): string {
  const phrase = describeActivity(entry);
  const title = options.configurationTitle ?? (typeof entry.details.title === "string" ? entry.details.title : null);
  const object = phrase.aboutConfiguration ? (title ? `“${title}”` : "a configuration") : "";
  const words = [phrase.verb, object, phrase.rest].filter((part) => part !== "").join(" ");
  const sentence = options.actor ? `${options.actor} ${words}` : capitalise(words);
  return `${sentence}.`;
}

/** The first letter in upper case. */
export function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
