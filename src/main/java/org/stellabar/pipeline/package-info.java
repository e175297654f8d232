/**
 * The main job end to end: a scenario of stars in, every table, chart and notebook out.
 *
 * <p>{@link org.stellabar.pipeline.ScenarioRunner} builds each star with the structure package,
 * collects a cluster summary, and hands tables to the writers and chart specifications to the
 * charts package. The figure classes ({@link org.stellabar.pipeline.StarFigures},
 * {@link org.stellabar.pipeline.ClusterFigures}, {@link org.stellabar.pipeline.PlaneFigure}) are
 * the only place that knows which physical columns make which figure; the charts package draws
 * whatever it is given. All models are computed before the first file is written, so bad input
 * or a failed model leaves nothing behind, and every file is written atomically.
 *
 * <p><b>Internal.</b> Not part of the API (see {@link org.stellabar.api}): public for the other
 * packages of stellabar, and free to change between versions.
 */
package org.stellabar.pipeline;
