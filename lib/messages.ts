// Wording shared by an API route and the page that shows the same outcome.

export const invitationProblems = {
  invalid: "This invitation link is not valid.",
  expired:
    "This invitation has expired (they last 7 days). Ask the garden's owner to send a new one.",
  used: "This invitation was already used.",
  revoked: "This invitation was withdrawn by the garden's owner.",
  wrong_account:
    "This invitation was sent to another e-mail address. Sign in with that address to accept it.",
} as const;

export const RESET_REQUESTED_MESSAGE =
  "If an account uses that address, we have sent it a link to choose a new password. The link works once, for one hour.";

export const resetProblems = {
  invalid: "This reset link is not valid. Ask for a new one.",
  expired: "This reset link has expired (links last one hour). Ask for a new one.",
  used: "This reset link was already used. Ask for a new one if you still need it.",
} as const;

export const SIGN_UP_REQUESTED_MESSAGE =
  "Thanks. We have sent a message to that address. If it is new to Castline, your account is ready and this browser is signed in; if it already has an account, sign in with its password or reset it.";
