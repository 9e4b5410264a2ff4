// The project's take-off (per room, with the option counted in each, and the project's totals)
// and the comparison of every room's options, on one page.
import { Link } from 'react-router';
import {
  DEFAULT_COVERAGE_M2_PER_L,
  DEFAULT_PAINT_COATS,
  DEFAULT_WASTE_PERCENT,
  takeoffSettingsSchema,
} from '../../../../shared/analysis/takeoff-settings';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { Card, EmptyState, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import { useCompare, useProjectTakeoff, settingsQuery } from '../api/schedules';
import { useTakeoffSettings } from '../hooks/use-takeoff-settings';
import { CompareTable } from './compare-table';
import { LoadError } from './load-error';
import { NumberSetting } from './number-setting';
import { ProjectTotals, RoomTakeoffTables } from './takeoff-tables';

const fields = takeoffSettingsSchema.shape;

export function TakeoffPage({ projectId }: { projectId: string }) {
  const stored = useTakeoffSettings(projectId);
  const { settings } = stored;
  const counted = Object.values(stored.counted);
  const takeoff = useProjectTakeoff(projectId, settingsQuery(settings, counted));
  const compare = useCompare(projectId, settingsQuery(settings));

  if (takeoff.isPending) return <Spinner label="Counting…" />;
  if (takeoff.isError) return <LoadError error={takeoff.error} projectId={projectId} />;
  const { project, rooms, totals } = takeoff.data;

  return (
    <div>
      <PageHeader
        eyebrow={
          <>
            <Link to="/projects" className="hover:text-ink hover:underline">
              Projects
            </Link>{' '}
            /{' '}
            <Link to={`/projects/${projectId}`} className="hover:text-ink hover:underline">
              {project.name}
            </Link>
          </>
        }
        title="Take-off and comparison"
      >
        What to buy for each room’s counted option, and every option side by side.
      </PageHeader>

      <Card title="Counting" className="mb-6">
        <div className="flex flex-wrap items-start gap-4">
          <NumberSetting
            className="w-32"
            label="Coats"
            value={settings.coats}
            schema={fields.coats.unwrap()}
            onChange={(coats) => coats !== null && stored.setSettings({ coats })}
          />
          <NumberSetting
            className="w-44"
            label="Coverage (m² per litre)"
            value={settings.coverageM2PerL}
            schema={fields.coverageM2PerL.unwrap()}
            onChange={(coverageM2PerL) => coverageM2PerL !== null && stored.setSettings({ coverageM2PerL })}
          />
          <NumberSetting
            className="w-40"
            label="Flooring waste (%)"
            value={settings.wastePercent}
            schema={fields.wastePercent.unwrap()}
            onChange={(wastePercent) => wastePercent !== null && stored.setSettings({ wastePercent })}
          />
          <Button className="mt-7" variant="quiet" onClick={stored.reset}>
            Back to defaults
          </Button>
        </div>
        <p className="mt-3 text-sm text-ink-faint">
          Defaults are common practice: {DEFAULT_PAINT_COATS} coats, {DEFAULT_COVERAGE_M2_PER_L} m² per litre,{' '}
          {DEFAULT_WASTE_PERCENT} % waste; tins of 0.75, 1, 2.5, 5 and 10 L, with the least paint left over. The tin’s label and
          your fitter win. These figures are kept in this browser for this project.
        </p>
      </Card>

      {rooms.length === 0 ? (
        <EmptyState title="No rooms yet.">Add rooms on the project page to count what they need.</EmptyState>
      ) : (
        <div className="flex flex-col gap-6">
          <Card title="Project totals">
            <ProjectTotals totals={totals} />
          </Card>

          {rooms.map((room) => (
            <Card
              key={room.id}
              title={room.name}
              actions={
                room.counted && (
                  <div className="flex items-end gap-3">
                    <SelectField
                      label="Counted option"
                      className="w-56"
                      value={room.counted.id}
                      onChange={(e) => stored.setCounted(room.id, e.target.value)}
                    >
                      {room.options.map((o) => (
                        <option key={o.id} value={o.id}>
                          {o.label}
                          {o.id === room.chosenOptionId ? ' (chosen)' : ''}
                        </option>
                      ))}
                    </SelectField>
                    <Link
                      to={`/projects/${projectId}/rooms/${room.id}/options/${room.counted.id}/schedule`}
                      className="inline-flex h-10 items-center rounded-lg border border-line-strong bg-white px-4 text-[15px] font-semibold hover:bg-sand"
                    >
                      Schedule
                    </Link>
                  </div>
                )
              }
            >
              {room.takeoff ? (
                <RoomTakeoffTables takeoff={room.takeoff} roomName={room.name} onUnitCoverage={stored.setUnitCoverage} />
              ) : (
                <p className="text-ink-soft">This room has no options yet.</p>
              )}
            </Card>
          ))}

          <Card title="Compare options">
            {compare.isPending ? (
              <Spinner />
            ) : compare.isError ? (
              <Notice tone="error">{errorMessage(compare.error)}</Notice>
            ) : (
              <div className="flex flex-col gap-8">
                {compare.data.rooms.map((room) => (
                  <CompareTable key={room.id} projectId={projectId} room={room} />
                ))}
                <p className="text-sm text-ink-faint">
                  Budget is new pieces and finishes; the client’s own pieces cost nothing. Free floor is the floor not under a
                  piece you walk round (rugs and wall-hung pieces leave it free). Findings come from the fit check.
                </p>
              </div>
            )}
          </Card>
        </div>
      )}
    </div>
  );
}
