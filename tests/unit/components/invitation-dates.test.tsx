import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { InvitationList } from "@/components/members/invitation-list";
import { Providers } from "@/components/providers";
import { invitationMail } from "@/services/mail/templates";

// The members list and the invitation e-mail show one expiry the same way, in
// the garden's zone. 2026-12-09T03:20Z in America/Chicago is 9:20 PM on
// December 8: Central Standard Time is UTC−6 from the first Sunday of November
// (IANA tz database, "US" rules; from memory).

const expiresAt = "2026-12-09T03:20:00.000Z";
const expected = "December 8, 2026 at 9:20 PM (America/Chicago)";

describe("an invitation's expiry", () => {
  it("reads the same on the members list and in the e-mail, in the garden's zone", () => {
    render(
      <Providers>
        <InvitationList
          gardenId="00000000-0000-4000-8000-000000000001"
          timeZone="America/Chicago"
          initial={[
            {
              id: "00000000-0000-4000-8000-000000000002",
              email: "sam@example.com",
              role: "helper",
              expiresAt,
              mailStatus: "sent",
            },
          ]}
        />
      </Providers>,
    );
    expect(screen.getByText(/^until /)).toHaveTextContent(`until ${expected}`);
    const mail = invitationMail({
      gardenName: "Hollis Street Garden",
      inviterName: "Dana",
      role: "helper",
      acceptUrl: "https://castline.example.com/invite/t0k3n",
      expiresAt: new Date(expiresAt),
      timeZone: "America/Chicago",
    });
    expect(mail.text).toContain(`until ${expected}`);
  });
});
