import Link from "next/link";
import { buttonStyles, Card, CardBody } from "@/components/ui";
import { getPageUser } from "@/lib/auth/page-session";

export const dynamic = "force-dynamic";

const steps = [
  {
    title: "Know what your bins will make",
    text: "Each bin's castings and drained liquid, forecast month by month from its trays, its rhythm and your own harvest weights.",
  },
  {
    title: "Plan every bed's feeding",
    text: "Beds, containers and plantings with per-plant, per-area or per-pot rates; heavy feeders first when stock runs short.",
  },
  {
    title: "Balance supply against demand",
    text: "Stock carried over and aged out, shortfalls dated, and the extra tray or second bin that would close the gap.",
  },
  {
    title: "Share the garden by role",
    text: "Invite the people who tend it by e-mail: growers plan beds and bins, helpers log harvests and drains from a phone, viewers read along.",
  },
];

export default async function LandingPage() {
  const user = await getPageUser();
  return (
    <main className="mx-auto flex max-w-4xl flex-col gap-10 px-4 py-10 sm:py-16">
      <header className="flex flex-col gap-4">
        <p className="font-display text-2xl text-leaf-800">Castline</p>
        <h1 className="text-4xl leading-tight sm:text-5xl">
          Feed your garden from your worm bins, on a plan.
        </h1>
        <p className="max-w-2xl text-lg text-soil-700">
          For home growers, allotment holders and community gardens that make their own fertilizer.
          Castline forecasts what your bins produce, plans which beds get how much and when, and
          tells you early when there will not be enough.
        </p>
        <div className="flex flex-wrap gap-3">
          {user ? (
            <Link href="/gardens" className={buttonStyles({ variant: "primary", size: "lg" })}>
              Open your gardens
            </Link>
          ) : (
            <>
              <Link href="/sign-up" className={buttonStyles({ variant: "primary", size: "lg" })}>
                Start a garden
              </Link>
              <Link href="/sign-in" className={buttonStyles({ variant: "secondary", size: "lg" })}>
                Sign in
              </Link>
            </>
          )}
        </div>
      </header>
      <section aria-label="What Castline does" className="grid gap-4 sm:grid-cols-2">
        {steps.map((step) => (
          <Card key={step.title}>
            <CardBody>
              <h2 className="text-xl">{step.title}</h2>
              <p className="mt-2 text-soil-700">{step.text}</p>
            </CardBody>
          </Card>
        ))}
      </section>
    </main>
  );
}
