import { useState, type FormEvent } from "react";
import type { FakeStatusDto } from "@shared/api/notifications.ts";
import { Button } from "@/components/ui/button.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { useSetFakeBehaviour } from "../api/fakes.ts";

/** Tell one fake to refuse a share of requests or to answer slowly (for trying out retries). */
export function FakeBehaviourForm({ which, status }: { which: "mail" | "sms"; status: FakeStatusDto }) {
  const setBehaviour = useSetFakeBehaviour();
  const toast = useToast();
  const [percent, setPercent] = useState(String(Math.round(status.behaviour.failureRate * 100)));
  const [afterStoring, setAfterStoring] = useState(status.behaviour.failAfterStoring);
  const [delay, setDelay] = useState(String(status.behaviour.delayMs));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const failureRate = Number(percent) / 100;
    const delayMs = Number(delay);
    if (!(failureRate >= 0 && failureRate <= 1) || !(Number.isInteger(delayMs) && delayMs >= 0 && delayMs <= 60_000)) {
      toast.error("Not changed", "Give a share from 0 to 100 % and a delay from 0 to 60000 ms.");
      return;
    }
    setBehaviour.mutate(
      { [which]: { failureRate, failAfterStoring: afterStoring, delayMs } },
      { onSuccess: () => toast.success(`The ${which} fake now refuses ${percent} % of requests`), onError: (error) => toast.error("Not changed", describeErrorLine(error)) },
    );
  };

  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-2" aria-label={`Behaviour of the ${which} fake`}>
      <TextField label="Refuse (%)" type="number" min={0} max={100} className="w-24" value={percent} onChange={(e) => setPercent(e.target.value)} />
      <TextField label="Delay (ms)" type="number" min={0} max={60000} className="w-28" value={delay} onChange={(e) => setDelay(e.target.value)} />
      <label className="flex h-9 items-center gap-2 text-sm">
        <input type="checkbox" checked={afterStoring} onChange={(e) => setAfterStoring(e.target.checked)} />
        refuse after storing (lost reply)
      </label>
      <Button type="submit" size="sm" disabled={setBehaviour.isPending}>
        Apply
      </Button>
    </form>
  );
}
