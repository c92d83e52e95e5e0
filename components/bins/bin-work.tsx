"use client";

import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui";
import type { UnitSystem } from "@/lib/units";
import { BinLog } from "./bin-log";
import { LogEntryForm, type MoveTarget } from "./log-entry-form";

// The log and, for helpers and up, the quick form above it.

export function BinWork({
  gardenId,
  binId,
  system,
  today,
  targets,
  canLog,
}: {
  gardenId: string;
  binId: string;
  system: UnitSystem;
  today: string;
  targets: MoveTarget[];
  canLog: boolean;
}) {
  return (
    <>
      {canLog ? (
        <Card>
          <CardHeader>
            <CardTitle>Log bin work</CardTitle>
          </CardHeader>
          <CardBody>
            <LogEntryForm
              gardenId={gardenId}
              binId={binId}
              system={system}
              today={today}
              targets={targets}
            />
          </CardBody>
        </Card>
      ) : null}
      <Card>
        <CardHeader>
          <CardTitle>Log</CardTitle>
        </CardHeader>
        <CardBody>
          <BinLog gardenId={gardenId} binId={binId} system={system} />
        </CardBody>
      </Card>
    </>
  );
}
