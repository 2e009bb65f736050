import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO, FakeClock, signedInAgent } from '../../../tests/helpers/test-server.js';
import { returnedMail } from '../mail/mail-templates.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';
import { runOnBoard } from '../review/review-test-client.js';

let server: MailTestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
beforeAll(async () => {
  server = await startMailTestServer({ clock });
});
afterAll(() => server.close());

describe('the returned e-mail', () => {
  it('names the vessel and the engine and links to the run page', async () => {
    const skua = await runOnBoard(server.app, 'Skua');
    const tech = await signedInAgent(server.app, DEMO.technician);
    const phases = (await tech.get(`/api/runs/${skua.id}/review`)).body.phases;
    const res = await tech.post(`/api/runs/${skua.id}/sign-off`).send({
      decision: 'return',
      comments: 'Hold full throttle for short bursts only.',
      rerunPhaseIds: [phases.at(-1).id],
    });
    expect(res.status).toBe(200);
    const mail = await server.catcher.waitFor((m) =>
      m.subject.startsWith('Break-in returned: Skua'),
    );
    expect(mail.subject).toBe('Break-in returned: Skua, single engine (Norrvik NV-40 4S)');
    expect(mail.to).toEqual(['sunniva@skipper.example']);
    expect(mail.text).toContain(
      'Vessel: Skua\nEngine: single, Norrvik NV-40 4S, serial NV40-26-00233',
    );
    expect(mail.text).toMatch(
      new RegExp(`Open the run in Ringseat to see why and carry on: http\\S+/runs/${skua.id}\\n`),
    );
    expect(mail.text).toContain('kill-switch lanyard');
  });

  it('lists the phases to run again when it is given them', () => {
    const common = {
      to: ['crew@skipper.example'],
      workshopName: 'Quayside Marine Works',
      vesselName: 'Petrel',
      engine: { position: 'port', maker: 'Maker', model: 'M-1', serialNumber: 'SN-1' },
      technicianName: 'Ada Harbour',
      link: 'https://ringseat.example/runs/r-1',
      comments: 'Run the cruise phase again.',
      reasons: ['Held above the ceiling for 6 min.'],
    };
    const withPhases = returnedMail({ ...common, rerunPhaseNames: ['Cruise', 'Bursts'] }).text;
    expect(withPhases).toContain(
      "The workshop's comments:\nRun the cruise phase again.\n\nPhases to run again:\n- Cruise\n- Bursts\n\nWhat the log shows:\n- Held above the ceiling for 6 min.",
    );
    expect(returnedMail(common).text).not.toContain('Phases to run again');
  });
});
