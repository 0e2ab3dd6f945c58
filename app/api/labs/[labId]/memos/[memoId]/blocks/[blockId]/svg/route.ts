import { requireUser } from '@/lib/auth/session';
import { authorize } from '@/lib/authz';
import { route } from '@/lib/http';
import { memoInLab } from '@/lib/memos';
import { blockSvg } from '@/lib/memos/results';
import { parseWith } from '@/lib/validation';
import { blockParams } from '../../../../schema';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ labId: string; memoId: string; blockId: string }> };

/** A block's figure as an SVG file, rendered on the server from the same Vega-Lite spec as on screen. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const user = await requireUser();
  const { labId, memoId, blockId } = parseWith(blockParams, await params, 'block');
  await authorize(user.id, labId, 'memo:read');
  const memo = await memoInLab(labId, memoId);
  const svg = await blockSvg(labId, memo.doc, blockId);
  const name = `${memo.title.replace(/[^\w.-]+/g, '-').slice(0, 60) || 'memo'}-${blockId.slice(0, 8)}.svg`;
  return new Response(svg, { headers: { 'content-type': 'image/svg+xml; charset=utf-8', 'content-disposition': `attachment; filename="${name}"`, 'cache-control': 'private, no-store' } });
});
