import { useEffect, useState } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import type { ListStatus } from '../../../shared/vessels/vessel.schema';
import { useSkippers, useVesselList } from '../../features/vessels/api';
import { useEngineList } from '../../features/vessels/engine-api';
import { EnginesList } from '../../features/vessels/components/engines-list';
import { SkippersList } from '../../features/vessels/components/skippers-list';
import {
  ChecklistFilter,
  ListControls,
  VesselTypeFilter,
} from '../../features/vessels/components/list-controls';
import { checklistStateOf } from '../../features/vessels/components/status-pills';
import { VesselForm } from '../../features/vessels/components/vessel-form';
import { VesselsList } from '../../features/vessels/components/vessels-list';
import { Button } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { cx } from '../../components/ui/cx';
import { TextField } from '../../components/ui/field';
import { LoadError, Loading } from '../../components/ui/status-message';
import { useSettled } from '../../lib/use-settled';
import { StaffOnly } from './staff-only';

/** Each list starts with its own search and filters: a vessel's home port means nothing to an engine. */
type View = 'vessels' | 'engines' | 'skippers';

function ViewSwitch({ view, onSwitch }: { view: View; onSwitch: () => void }) {
  const tab = (to: View, label: string) => (
    <Link
      to={to === 'vessels' ? '?' : `?view=${to}`}
      aria-current={view === to ? 'page' : undefined}
      onClick={onSwitch}
      className={cx(
        'flex min-h-touch flex-1 items-center justify-center border-2 border-ink px-4 font-bold no-underline sm:flex-none',
        view === to ? 'bg-ink text-paper' : 'bg-surface text-ink',
      )}
    >
      {label}
    </Link>
  );
  return (
    <nav aria-label="List" className="flex">
      {tab('vessels', 'Vessels')}
      {tab('engines', 'Engines')}
      {tab('skippers', 'Skippers')}
    </nav>
  );
}

function VesselsSection({ q, status, type }: { q: string; status: ListStatus; type: string }) {
  const vessels = useVesselList({ q, status });
  if (vessels.isPending) return <Loading label="Loading vessels…" />;
  if (vessels.isError)
    return <LoadError error={vessels.error} what="the vessels" onRetry={() => vessels.refetch()} />;
  return <VesselsList vessels={vessels.data.filter((v) => !type || v.type === type)} />;
}

function EnginesSection({
  q,
  status,
  checklist,
}: {
  q: string;
  status: ListStatus;
  checklist: string;
}) {
  const engines = useEngineList({ q, status });
  if (engines.isPending) return <Loading label="Loading engines…" />;
  if (engines.isError)
    return <LoadError error={engines.error} what="the engines" onRetry={() => engines.refetch()} />;
  const shown = engines.data.filter((e) => !checklist || checklistStateOf(e) === checklist);
  return (
    <EnginesList engines={shown} emptyText="No engines match. Change the search or the filters." />
  );
}

function SkippersSection({ q }: { q: string }) {
  const skippers = useSkippers();
  const vessels = useVesselList({ q: '', status: 'all' });
  if (skippers.isPending || vessels.isPending) return <Loading label="Loading skippers…" />;
  if (skippers.isError)
    return (
      <LoadError error={skippers.error} what="the skippers" onRetry={() => skippers.refetch()} />
    );
  if (vessels.isError)
    return <LoadError error={vessels.error} what="the vessels" onRetry={() => vessels.refetch()} />;
  return (
    <SkippersList
      skippers={skippers.data}
      vesselNames={new Map(vessels.data.map((v) => [v.id, v.name]))}
      q={q}
    />
  );
}

/** Which list, its search and its filters live in the address, so Back returns to the same view. */
function useListState() {
  const [params, setParams] = useSearchParams();
  const view: View =
    params.get('view') === 'engines'
      ? 'engines'
      : params.get('view') === 'skippers'
        ? 'skippers'
        : 'vessels';
  const status = (
    ['archived', 'all'].includes(params.get('status') ?? '') ? params.get('status') : 'active'
  ) as ListStatus;
  const [q, setQ] = useState(params.get('q') ?? '');
  const settledQ = useSettled(q);
  const set = (key: string, value: string) =>
    setParams(
      (p) => {
        if (value) p.set(key, value);
        else p.delete(key);
        return p;
      },
      { replace: true },
    );
  useEffect(() => set('q', settledQ), [settledQ]); // eslint-disable-line react-hooks/exhaustive-deps
  return { view, status, q, setQ, settledQ, extra: params.get('filter') ?? '', set };
}

function Filters({ list }: { list: ReturnType<typeof useListState> }) {
  const { view, q, setQ, status, extra, set } = list;
  if (view === 'skippers') {
    return (
      <div className="max-w-xl">
        <TextField
          label="Search"
          type="text"
          enterKeyHint="search"
          value={q}
          autoComplete="off"
          hint="Name, e-mail or vessel"
          onChange={(e) => setQ(e.target.value)}
        />
      </div>
    );
  }
  const hint =
    view === 'vessels'
      ? 'Name, HIN, home port, skipper, or an engine’s maker, model or serial'
      : 'Maker, model, serial, position or vessel';
  return (
    <ListControls
      label={view === 'vessels' ? 'Search vessels' : 'Search engines'}
      hint={hint}
      q={q}
      onSearch={setQ}
      status={status}
      onStatus={(s) => set('status', s === 'active' ? '' : s)}
    >
      {view === 'vessels' ? (
        <VesselTypeFilter value={extra} onChange={(type) => set('filter', type)} />
      ) : (
        <ChecklistFilter value={extra} onChange={(state) => set('filter', state)} />
      )}
    </ListControls>
  );
}

function FleetPage() {
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);
  const list = useListState();
  const { view, settledQ, status, extra } = list;
  return (
    <div className="flex flex-col gap-5">
      <title>Vessels and engines · Ringseat</title>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-3xl font-bold">Vessels and engines</h1>
        {!adding && <Button onClick={() => setAdding(true)}>Add a vessel</Button>}
      </div>
      {adding && (
        <Card title="New vessel">
          <VesselForm
            onSaved={(v) => navigate(`/vessels/${v.id}`)}
            onCancel={() => setAdding(false)}
          />
        </Card>
      )}
      <ViewSwitch view={view} onSwitch={() => list.setQ('')} />
      <Filters list={list} />
      {view === 'vessels' && <VesselsSection q={settledQ} status={status} type={extra} />}
      {view === 'engines' && <EnginesSection q={settledQ} status={status} checklist={extra} />}
      {view === 'skippers' && <SkippersSection q={list.q} />}
    </div>
  );
}

export function VesselsRoute() {
  return (
    <StaffOnly title="Vessels and engines">
      <FleetPage />
    </StaffOnly>
  );
}

export { VesselsRoute as Component };
