import { useNavigate, useParams } from 'react-router-dom';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useDrill } from '@/features/drills/api/get-drill';
import Paper from '@mui/material/Paper';
import { DrillEditor } from '@/features/drills/components/drill-editor';
import { DrillManageActions } from '@/features/drills/components/drill-manage-actions';
import { ReferenceCard } from '@/features/drills/components/reference-card';

/** The drill editor's own chunk: loaded only when a teacher opens it. */
export default function DrillEditorRoute() {
  const { drillId } = useParams();
  const navigate = useNavigate();
  const drill = useDrill({ id: drillId ?? '', queryConfig: { enabled: Boolean(drillId) } });
  const onSaved = () => navigate(paths.teacher.drills.getHref());

  if (!drillId) {
    return (
      <>
        <PageHeader title="New drill" />
        <DrillEditor onSaved={onSaved} />
      </>
    );
  }
  if (drill.isPending) return <Loading label="Loading the drill…" />;
  if (drill.isError) return <ErrorAlert error={drill.error} onRetry={() => drill.refetch()} />;
  return (
    <>
      <PageHeader
        title={`Edit: ${drill.data.title}`}
        actions={
          <DrillManageActions
            drill={drill.data}
            onDuplicated={(copy) => navigate(paths.teacher.editDrill.getHref(copy.id))}
            onDeleted={() => navigate(paths.teacher.drills.getHref())}
          />
        }
      />
      <DrillEditor key={drill.data.id} drill={drill.data} onSaved={onSaved} />
      <Paper sx={{ p: 2.5, mt: 3 }}>
        <ReferenceCard drillId={drill.data.id} />
      </Paper>
    </>
  );
}
