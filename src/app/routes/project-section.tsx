/**
 * Project sections (reference cases, uploads, tokens): each page under /projects/:slug/…, and the
 * bare /reference-cases, /uploads, /tokens addresses that go to the last project used (or the first).
 */
import type { ReactNode } from 'react';
import { Navigate } from 'react-router-dom';
import { useProjects } from '@/features/projects/api/get-projects';
import { ReferenceCases } from '@/features/reference-cases/components/reference-cases';
import { UploadForm } from '@/features/uploads/components/upload-form';
import { UploadsList } from '@/features/uploads/components/uploads-list';
import { CreateToken } from '@/features/tokens/components/create-token';
import { TokenList } from '@/features/tokens/components/token-list';
import { useTokens } from '@/features/tokens/api/tokens';
import { PageHeader, Panel } from '@/components/panel';
import { QueryState } from '@/components/query-state';
import type { ProjectRight } from '@/lib/api-types';
import { rememberedProject } from '@/lib/current-project';
import { projectPath } from '@/lib/paths';
import { useProjectPage } from '../use-project-page';
import { Crumbs } from './crumbs';

export function SectionRedirect({ section }: { section: string }) {
  const q = useProjects();
  const remembered = rememberedProject();
  return (
    <QueryState q={q} what="your projects">
      {(list) => {
        const slug = list.find((p) => p.slug === remembered)?.slug ?? list[0]?.slug;
        return slug ? <Navigate to={`${projectPath(slug)}/${section}`} replace /> : <p className="text-sm text-ink-2">You are not a member of any project yet.</p>;
      }}
    </QueryState>
  );
}

function Section({ title, children }: { title: string; children: (slug: string, rights: readonly ProjectRight[]) => ReactNode }) {
  const { slug, project, rights } = useProjectPage();
  return (
    <QueryState q={project} what="the project">
      {(p) => <><PageHeader context={<Crumbs slug={slug} project={p.name} />} title={title} />{children(slug, rights)}</>}
    </QueryState>
  );
}

export const ReferenceCasesPage = () => <Section title="Reference cases and CI checks">{(slug) => <ReferenceCases slug={slug} />}</Section>;

export const UploadsPage = () => (
  <Section title="Uploads">
    {(slug, rights) => (
      <div className="flex max-w-5xl flex-col gap-3">
        <Panel title="Upload a file">
          {rights.includes('uploads:write') ? <UploadForm slug={slug} />
            : <p className="m-0 px-3 py-2 text-xs text-ink-2">Your role in this project can download files but not upload them.</p>}
        </Panel>
        <Panel title="Files"><UploadsList slug={slug} /></Panel>
      </div>
    )}
  </Section>
);

function Tokens({ slug, rights }: { slug: string; rights: readonly ProjectRight[] }) {
  const q = useTokens(slug);
  if (!rights.includes('tokens:manage')) return <p className="text-sm text-ink-2">Your role in this project cannot hold API tokens. An engineer or a project admin can.</p>;
  return (
    <div className="flex max-w-6xl flex-col gap-3">
      <Panel title="New token"><CreateToken slug={slug} rights={rights} /></Panel>
      <Panel title="Tokens" count={q.data?.length}><QueryState q={q} what="the tokens">{(list) => <TokenList slug={slug} tokens={list} />}</QueryState></Panel>
    </div>
  );
}

export const TokensPage = () => <Section title="API tokens">{(slug, rights) => <Tokens slug={slug} rights={rights} />}</Section>;
