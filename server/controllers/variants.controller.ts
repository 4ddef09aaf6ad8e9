import { pipeline } from 'node:stream/promises';
import type { Request, Response } from 'express';
import { currentProject } from '../http/context';
import { variantBins, variantPoints } from '../services/variants-chart.service';
import { variantsCsv } from '../services/variants-csv.service';
import { variantDetail } from '../services/variants-detail.service';
import { listVariants } from '../services/variants.service';

const query = (req: Request) => req.query as Record<string, unknown>;
const runId = (req: Request) => String(req.params.runId);

export async function getVariants(req: Request, res: Response): Promise<void> {
  res.json(await listVariants(currentProject(req), runId(req), query(req)));
}

export async function getVariantsCsv(req: Request, res: Response): Promise<void> {
  const { filename, body } = await variantsCsv(currentProject(req), runId(req), query(req));
  res.type('text/csv; charset=utf-8').attachment(filename);
  // A client that goes away mid-download is not an error of the server.
  await pipeline(body, res).catch((e: NodeJS.ErrnoException) => {
    if (e.code !== 'ERR_STREAM_PREMATURE_CLOSE') throw e;
  });
}

export async function getPoints(req: Request, res: Response): Promise<void> {
  res.json(await variantPoints(currentProject(req), runId(req), query(req)));
}

export async function getAggregate(req: Request, res: Response): Promise<void> {
  res.json(await variantBins(currentProject(req), runId(req), query(req)));
}

export async function getVariant(req: Request, res: Response): Promise<void> {
  res.json(await variantDetail(currentProject(req), runId(req), String(req.params.index)));
}
