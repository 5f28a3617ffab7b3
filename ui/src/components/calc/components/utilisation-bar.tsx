import classes from './check-list.module.css';

/** Scale of the bar: 0 … 125 % utilisation, with the limit (100 %) marked. */
const SCALE = 1.25;
const LIMIT_AT = `${(1 / SCALE) * 100}%`;

/**
 * How much of the allowed margin a check uses. The bar has a tick at the limit and the number
 * beside it, so the reading never depends on colour. Plain elements: it renders on every key that
 * moves its check.
 */
export function UtilisationBar({ utilisation, pass }: { utilisation: number; pass: boolean }) {
  const finite = Number.isFinite(utilisation) ? Math.max(0, utilisation) : SCALE;
  const width = Math.min(finite / SCALE, 1) * 100;
  const percent = Number.isFinite(utilisation) ? `${Math.round(utilisation * 100)} %` : '∞';
  return (
    <div className={classes.meter}>
      <div
        role="meter"
        aria-label="Utilisation"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(finite * 100)}
        aria-valuetext={`${percent} of the limit`}
        className={classes.track}
      >
        <div
          className={classes.fill}
          data-fail={pass ? undefined : ''}
          style={{ width: `${width}%` }}
        />
        <div className={classes.tick} style={{ left: LIMIT_AT }} aria-hidden />
      </div>
      <span className={classes.percent}>{percent}</span>
    </div>
  );
}
