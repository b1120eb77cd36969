import type { FakesBehaviourInput, FakesStatusDto } from "../../shared/api/notifications.ts";
import { FakeMailServer } from "./fake-mail-server.ts";
import { FakeSmsServer } from "./fake-sms-server.ts";

/** The two local stand-ins for hosted services. Each runs only when its real credentials are absent. */
export class LocalFakes {
  readonly mail = new FakeMailServer();
  readonly sms = new FakeSmsServer();

  status(): FakesStatusDto {
    return { mail: this.mail.status(), sms: this.sms.status() };
  }

  setBehaviour(input: FakesBehaviourInput): FakesStatusDto {
    if (input.mail) this.mail.misbehaviour.set(input.mail);
    if (input.sms) this.sms.misbehaviour.set(input.sms);
    return this.status();
  }

  async stop(): Promise<void> {
    await Promise.all([this.mail.stop(), this.sms.stop()]);
  }
}
