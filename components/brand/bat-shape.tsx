// One bat in flight, our own drawing: ears, a small body and two scalloped wings, in a 24 × 10
// box centred on x = 12. Placed and scaled by the caller with a transform.
const batPath =
  "M12 3.2 12.8 2l.4 1.6Q17 1 23 1.5q-2 3-4 3.7-1-1-3 .8-1-1-3 1.2L12 8.5l-1-1.3q-2-2.2-3-1.2-1-1.8-3-.8-2-.7-4-3.7 6-.5 9.8 2.1l.4-1.6Z";

type BatShapeProps = {
  x: number;
  y: number;
  scale?: number;
  rotate?: number;
  fill: string;
  opacity?: number;
};

/** A bat silhouette for use inside an <svg>; (x, y) is its centre. */
export function BatShape({ x, y, scale = 1, rotate = 0, fill, opacity }: BatShapeProps) {
  return (
    <path
      d={batPath}
      fill={fill}
      opacity={opacity}
      transform={`translate(${x} ${y}) rotate(${rotate}) scale(${scale}) translate(-12 -5)`}
    />
  );
}
