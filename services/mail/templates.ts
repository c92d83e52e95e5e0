import { formatDateTime } from "@/lib/format";
import { requireHttpUrl, requireLine, requireText } from "./mail-input";

export const PRODUCT_NAME = "Castline";
const TAGLINE = "Castline — garden feeding planned around your worm bins.";
const DEFAULT_REASON = "this address was entered on Castline";

export type MailAction = { label: string; url: string };
export type MailListItem = { label: string; text: string };

export type RenderMailInput = {
  heading: string;
  paragraphs: string[];
  /** Rows such as dated tasks, shown after the paragraphs. */
  list?: MailListItem[];
  action?: MailAction;
  /** Completes "You are getting this because …", e.g. "you were invited to Hollis Street Garden". */
  footerNote?: string;
};

export type RenderedMail = { text: string; html: string };

/** Encodes the five characters that can end an HTML text node or attribute value. */
export function escapeHtml(value: string): string {
  return value
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

const COLORS = {
  ink: "#26302a",
  muted: "#5f6b62",
  page: "#f4f2ec",
  card: "#ffffff",
  btn: "#3c6b4a",
};
const FONT = "font-family:Helvetica,Arial,sans-serif;";

function htmlParagraph(text: string): string {
  return `<p style="${FONT}margin:0 0 16px;font-size:16px;line-height:1.5;color:${COLORS.ink};">${escapeHtml(text)}</p>`;
}

function htmlList(items: MailListItem[]): string {
  const rows = items
    .map(
      (item) =>
        `<tr><td style="${FONT}padding:6px 12px 6px 0;font-size:15px;color:${COLORS.muted};white-space:nowrap;vertical-align:top;">${escapeHtml(item.label)}</td>` +
        `<td style="${FONT}padding:6px 0;font-size:15px;color:${COLORS.ink};">${escapeHtml(item.text)}</td></tr>`,
    )
    .join("");
  return `<table role="presentation" cellpadding="0" cellspacing="0" style="margin:0 0 16px;border-collapse:collapse;">${rows}</table>`;
}

function htmlAction(action: MailAction, url: string): string {
  return (
    `<p style="margin:8px 0 24px;"><a href="${escapeHtml(url)}" style="${FONT}display:inline-block;padding:12px 20px;border-radius:6px;background:${COLORS.btn};color:#ffffff;font-size:16px;font-weight:bold;text-decoration:none;">${escapeHtml(action.label)}</a></p>` +
    `<p style="${FONT}margin:0 0 16px;font-size:13px;line-height:1.5;color:${COLORS.muted};">If the button does not work, paste this link into your browser:<br>${escapeHtml(url)}</p>`
  );
}

/** Builds the plain-text and HTML parts of one e-mail from the same content. */
export function renderMail(input: RenderMailInput): RenderedMail {
  const heading = requireText(input.heading, "heading");
  const paragraphs = input.paragraphs.map((p, i) => requireText(p, `paragraphs[${i}]`));
  const list = input.list ?? [];
  const action = input.action;
  const actionUrl = action ? requireHttpUrl(action.url, "action.url") : undefined;
  if (action) requireText(action.label, "action.label");
  const reason = input.footerNote?.trim() || DEFAULT_REASON;
  const footer = `You are getting this because ${reason}.`;

  const textParts = [heading, ...paragraphs];
  if (list.length > 0)
    textParts.push(list.map((item) => `- ${item.label}: ${item.text}`).join("\n"));
  if (action && actionUrl) textParts.push(`${action.label}: ${actionUrl}`);
  textParts.push(`--\n${footer}\n${TAGLINE}`);
  const text = `${textParts.join("\n\n")}\n`;

  const body = [
    `<h1 style="${FONT}margin:0 0 20px;font-size:22px;line-height:1.3;color:${COLORS.ink};">${escapeHtml(heading)}</h1>`,
    ...paragraphs.map(htmlParagraph),
    list.length > 0 ? htmlList(list) : "",
    action && actionUrl ? htmlAction(action, actionUrl) : "",
  ].join("");
  const html =
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>${escapeHtml(heading)}</title></head>` +
    `<body style="margin:0;padding:24px 12px;background:${COLORS.page};">` +
    `<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="max-width:560px;margin:0 auto;border-collapse:collapse;">` +
    `<tr><td style="${FONT}padding:0 0 12px;font-size:15px;font-weight:bold;letter-spacing:0.04em;color:${COLORS.btn};">${PRODUCT_NAME}</td></tr>` +
    `<tr><td style="padding:28px 24px;background:${COLORS.card};border-radius:8px;">${body}</td></tr>` +
    `<tr><td style="${FONT}padding:16px 4px 0;font-size:12px;line-height:1.5;color:${COLORS.muted};">${escapeHtml(footer)}<br>${escapeHtml(TAGLINE)}</td></tr>` +
    `</table></body></html>`;

  return { text, html };
}

/** A ready-to-send e-mail body; the caller adds the recipient. */
export type MailContent = RenderedMail & { subject: string };

export type InvitedRole = "owner" | "grower" | "helper" | "viewer";

// Plain descriptions of what each role may do, matching the per-garden role table.
const ROLE_DUTIES: Record<InvitedRole, string> = {
  owner: "run the garden, including its members and roles",
  grower: "plan beds, plantings and bins and log any work",
  helper: "log feedings and bin work and see the plan",
  viewer: "read the plan and the logs",
};

function requireDate(value: Date, field: string): Date {
  if (!(value instanceof Date) || Number.isNaN(value.getTime())) {
    throw new Error(`${field} must be a valid date`);
  }
  return value;
}

export function invitationMail(input: {
  gardenName: string;
  inviterName: string;
  role: InvitedRole;
  acceptUrl: string;
  expiresAt: Date;
  /** IANA zone for the expiry time; UTC unless the garden has its own. */
  timeZone?: string;
}): MailContent {
  const gardenName = requireLine(input.gardenName, "gardenName");
  const inviterName = requireLine(input.inviterName, "inviterName");
  const duties = ROLE_DUTIES[input.role];
  if (!duties) throw new Error(`role must be owner, grower, helper or viewer`);
  const expires = formatDateTime(
    requireDate(input.expiresAt, "expiresAt"),
    input.timeZone ?? "UTC",
  );
  const rendered = renderMail({
    heading: `Join ${gardenName} on ${PRODUCT_NAME}`,
    paragraphs: [
      `${inviterName} invited you to ${gardenName} as a ${input.role}: you will be able to ${duties}.`,
      `The invitation works until ${expires}.`,
    ],
    action: { label: "Accept the invitation", url: input.acceptUrl },
    footerNote: `${inviterName} invited this address to ${gardenName}. If you did not expect it, ignore this e-mail and nothing changes`,
  });
  return { subject: `${inviterName} invited you to ${gardenName} on ${PRODUCT_NAME}`, ...rendered };
}

export function passwordResetMail(input: {
  resetUrl: string;
  expiresInMinutes: number;
}): MailContent {
  const minutes = input.expiresInMinutes;
  if (!Number.isInteger(minutes) || minutes < 1 || minutes > 24 * 60) {
    throw new Error(`expiresInMinutes must be a whole number from 1 to 1440`);
  }
  const rendered = renderMail({
    heading: "Choose a new password",
    paragraphs: [
      `Someone asked to reset the ${PRODUCT_NAME} password for this address.`,
      `The link below stops working after ${minutes} minute${minutes === 1 ? "" : "s"}.`,
      "If you did not ask for this, ignore this e-mail: your password stays as it is.",
    ],
    action: { label: "Set a new password", url: input.resetUrl },
    footerNote: `a password reset was requested for this address on ${PRODUCT_NAME}`,
  });
  return { subject: `Reset your ${PRODUCT_NAME} password`, ...rendered };
}

/** Sent after a sign-up with a new address: the account is ready. */
export function welcomeMail(input: { name: string; signInUrl: string }): MailContent {
  const name = requireLine(input.name, "name");
  const rendered = renderMail({
    heading: `Welcome to ${PRODUCT_NAME}, ${name}`,
    paragraphs: [
      `Your ${PRODUCT_NAME} account for this address is ready, and the browser you signed up in is signed in.`,
      "If you did not sign up, reset the password from the sign-in page or simply ignore the account.",
    ],
    action: { label: "Sign in", url: input.signInUrl },
    footerNote: `someone signed up for ${PRODUCT_NAME} with this address`,
  });
  return { subject: `Your ${PRODUCT_NAME} account is ready`, ...rendered };
}

/** Sent instead of an error when someone signs up with an address that already has an account. */
export function signUpAttemptMail(input: { signInUrl: string; resetUrl: string }): MailContent {
  const rendered = renderMail({
    heading: "Someone tried to sign up with your address",
    paragraphs: [
      `Someone tried to sign up for ${PRODUCT_NAME} with this address, which already has an account. No new account was made and nothing changed.`,
      `If it was you, sign in with your password, or choose a new one at ${input.resetUrl}.`,
      "If it was not you, you need do nothing.",
    ],
    action: { label: "Sign in", url: input.signInUrl },
    footerNote: `a sign-up was attempted with this address on ${PRODUCT_NAME}`,
  });
  return { subject: `Sign-up attempt for your ${PRODUCT_NAME} account`, ...rendered };
}

export type ReminderItem = { date: string; text: string };

// Reminder dates are floating all-day dates (YYYY-MM-DD), so they are read and shown in UTC
// to keep the calendar day from shifting with the server's zone.
function formatDay(value: string, field: string): string {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
  const date = match ? new Date(`${value}T00:00:00Z`) : null;
  if (
    !match ||
    !date ||
    Number.isNaN(date.getTime()) ||
    date.toISOString().slice(0, 10) !== value
  ) {
    throw new Error(`${field} must be a calendar date YYYY-MM-DD, got "${value}"`);
  }
  return new Intl.DateTimeFormat("en-US", {
    timeZone: "UTC",
    weekday: "short",
    month: "short",
    day: "numeric",
  }).format(date);
}

export function reminderMail(input: {
  gardenName: string;
  items: ReminderItem[];
  calendarUrl?: string;
}): MailContent {
  const gardenName = requireLine(input.gardenName, "gardenName");
  if (input.items.length === 0) throw new Error("items must hold at least one task");
  const list = input.items
    .map((item, i) => ({
      date: item.date,
      label: formatDay(item.date, `items[${i}].date`),
      text: requireText(item.text, `items[${i}].text`),
    }))
    .sort((a, b) => a.date.localeCompare(b.date))
    .map(({ label, text }) => ({ label, text }));
  const count = list.length;
  const rendered = renderMail({
    heading: `Coming up at ${gardenName}`,
    paragraphs: [`${count} task${count === 1 ? "" : "s"} planned for ${gardenName}:`],
    list,
    action: input.calendarUrl ? { label: "Open the calendar", url: input.calendarUrl } : undefined,
    footerNote: `you asked for feeding reminders for ${gardenName}`,
  });
  return {
    subject: `${gardenName}: ${count} task${count === 1 ? "" : "s"} coming up`,
    ...rendered,
  };
}
