import { isValidElement, type ReactElement, type ReactNode } from "react";
import { describe, expect, it, vi } from "vitest";
import { SignInForm } from "@/components/auth/sign-in-form";
import SignInPage from "@/app/(auth)/sign-in/page";

vi.mock("next/navigation", () => ({ useRouter: () => ({ replace: vi.fn(), refresh: vi.fn() }) }));

// Where the sign-in page hands `next` to the form: the probe was
// /sign-in?next=/%5Cevil.example/x, which Next decodes to "/\evil.example/x".

function findProps(node: ReactNode, type: unknown): Record<string, unknown> | undefined {
  if (Array.isArray(node)) {
    for (const child of node) {
      const found = findProps(child, type);
      if (found) return found;
    }
    return undefined;
  }
  if (!isValidElement(node)) return undefined;
  const element = node as ReactElement<Record<string, unknown> & { children?: ReactNode }>;
  if (element.type === type) return element.props;
  return findProps(element.props.children, type);
}

describe("sign-in page", () => {
  it.each(["/\\evil.example/x", "/\t/evil.example", "https://evil.example"])(
    "gives the form a path on our origin for next=%j",
    async (next) => {
      const page = await SignInPage({ searchParams: Promise.resolve({ next }) });
      expect(findProps(page, SignInForm)?.next).toBe("/gardens");
    },
  );

  it("passes our own path through", async () => {
    const page = await SignInPage({ searchParams: Promise.resolve({ next: "/account" }) });
    expect(findProps(page, SignInForm)?.next).toBe("/account");
  });
});
