/** Talks to a running server the way a browser would (Origin, session cookie), for e2e test setup and checks. */
export async function apiSession(baseURL: string, email: string, password = 'ringseat-demo') {
  const call = async (path: string, init: { method?: string; body?: unknown } = {}) => {
    const res = await fetch(baseURL + path, {
      method: init.method ?? (init.body === undefined ? 'GET' : 'POST'),
      headers: { 'content-type': 'application/json', origin: baseURL, cookie },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
    });
    const text = await res.text();
    return { status: res.status, body: text ? JSON.parse(text) : undefined };
  };
  let cookie = '';
  const signIn = await fetch(`${baseURL}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: baseURL },
    body: JSON.stringify({ email, password }),
  });
  if (!signIn.ok) throw new Error(`sign-in as ${email}: ${signIn.status}`);
  cookie = signIn.headers.get('set-cookie')!.split(';')[0];
  return call;
}

type Api = Awaited<ReturnType<typeof apiSession>>;
type RunView = {
  id: string;
  state: string;
  engine: { id: string };
  program: { phases: Array<{ id: string; performedBy: string }> };
};

/** An open run on the given engine: the existing one when there is one, else a new one. */
export async function openRunFor(
  tech: Api,
  vesselName: string,
  position: string,
  programKey = 'four-stroke-outboard',
): Promise<RunView> {
  const vessels = (await tech('/api/vessels')).body.vessels as Array<{
    name: string;
    engines: Array<{ id: string; position: string }>;
  }>;
  const engine = vessels
    .find((v) => v.name === vesselName)!
    .engines.find((e) => e.position === position)!;
  const runs = (await tech('/api/runs')).body.runs as Array<{
    id: string;
    state: string;
    engine: { id: string };
  }>;
  const open = runs.find(
    (r) => r.engine.id === engine.id && ['planned', 'under-way', 'returned'].includes(r.state),
  );
  if (open) return (await tech(`/api/runs/${open.id}`)).body.run;
  const program = (await tech('/api/programs')).body.programs.find(
    (p: { builtInKey: string }) => p.builtInKey === programKey,
  );
  const created = await tech('/api/runs', { body: { engineId: engine.id, programId: program.id } });
  if (created.status !== 201)
    throw new Error(`assign: ${created.status} ${JSON.stringify(created.body)}`);
  return created.body.run;
}
