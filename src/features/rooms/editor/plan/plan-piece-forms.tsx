// Each piece's top view on the plan, drawn from the same parts as its 3D form (a sofa's back and
// arms, a bed's pillows, a wardrobe's doors) in thin calm lines, and its label. The box outline
// underneath stays what is dragged and checked; this layer takes no pointer events.
import { memo, useMemo } from 'react';
import { formParts, type Part } from '../../../../../shared/geometry/forms';
import type { Piece } from '../../../../../shared/schemas/option';
import { labelColourOn, labelLayout, LABEL_DARK } from './piece-look';
import { planColour } from './plan-style';

const PART_LINE = planColour.partLine;

type TopViewPiece = Pick<Piece, 'kind' | 'settings' | 'width' | 'depth' | 'height' | 'x' | 'y' | 'rotation'>;

/** The parts seen from above, lowest first so the higher ones cover them (piece frame mm). */
export function topViewParts(piece: Pick<Piece, 'kind' | 'settings' | 'width' | 'depth' | 'height'>): Part[] {
  return formParts(piece.kind, piece.settings, { width: piece.width, depth: piece.depth, height: piece.height })
    .slice()
    .sort((a, b) => a.z + a.h - (b.z + b.h));
}

export function PartShape({ part, fill, stroke }: { part: Part; fill: string; stroke: number }) {
  if (part.shape === 'leg') {
    const r = (part.w * Math.max(1, part.taper ?? 1)) / 2;
    return <circle cx={part.x} cy={part.y} r={r} fill={fill} stroke={PART_LINE} strokeWidth={stroke} />;
  }
  const r = part.shape === 'rounded' ? (part.radius ?? 0) : 0;
  return (
    <rect
      x={part.x - part.w / 2}
      y={part.y - part.d / 2}
      width={part.w}
      height={part.d}
      rx={r}
      ry={r}
      fill={fill}
      stroke={PART_LINE}
      strokeWidth={stroke}
    />
  );
}

/** A piece's top view in the plan's line style; `fill` is the piece's colour on the plan. */
export const PieceTopView = memo(function PieceTopView({
  piece,
  fill,
  stroke,
}: {
  piece: TopViewPiece;
  fill: string;
  stroke: number;
}) {
  const parts = useMemo(() => topViewParts(piece), [piece.kind, piece.settings, piece.width, piece.depth, piece.height]); // eslint-disable-line react-hooks/exhaustive-deps
  // A plain block's one part is the box itself: the outline already says it all.
  if (!piece.kind || piece.kind === 'plain-block') return null;
  return (
    <g transform={`translate(${piece.x} ${piece.y}) rotate(${piece.rotation})`} pointerEvents="none" data-testid="piece-top-view">
      {parts.map((part, i) => (
        <PartShape key={i} part={part} fill={part.slot === 'own' ? (part.colour ?? fill) : fill} stroke={stroke} />
      ))}
    </g>
  );
});

/** The piece's name inside it when it fits, else beside it, in a colour that reads on the piece. */
export function PieceLabel({
  piece,
  text,
  fill,
}: {
  piece: Pick<Piece, 'x' | 'y' | 'width' | 'depth' | 'rotation' | 'name'>;
  text: number;
  fill: string;
}) {
  const layout = labelLayout(piece, text);
  const colour = layout.inside ? labelColourOn(fill) : LABEL_DARK;
  return (
    <text
      transform={`translate(${layout.at[0]} ${layout.at[1]}) rotate(${layout.angle})`}
      textAnchor="middle"
      dominantBaseline="central"
      fontSize={layout.size}
      fill={colour}
      stroke={layout.inside ? undefined : planColour.labelLight}
      strokeWidth={layout.inside ? undefined : layout.size * 0.18}
      paintOrder="stroke"
      pointerEvents="none"
      data-label-place={layout.inside ? 'inside' : 'beside'}
    >
      {piece.name}
    </text>
  );
}
