import { useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { paths } from '#src/config/paths.ts';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { CreateWorkshopForm } from '#src/features/workshops/components/create-workshop-form.tsx';

export default function CreateWorkshopPage() {
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const first = workshops.length === 0;

  return (
    <>
      <PageHeader
        title={first ? 'Create your workshop' : 'Create another workshop'}
        description="A workshop is where heats, photos and defect reports belong: a shop, a class or a club. You become its admin and can invite students, casters and mentors."
      />
      {first ? (
        <p className="mb-6 max-w-prose text-body text-ink">
          Were you invited to a workshop instead? Open the link in the invitation e-mail, and you join it straight away.
        </p>
      ) : null}
      <CreateWorkshopForm
        onCreated={(workshop) => {
          // The session lists memberships too.
          void queryClient.invalidateQueries({ queryKey: sessionQueries.all() });
          toast.success(`${workshop.name} is ready.`);
          void navigate(paths.heats.getHref(workshop.id));
        }}
      />
    </>
  );
}
