/**
 * Renderers of a run's outputs; they take plain records of numbers already in display units.
 *
 * <ul>
 *   <li>{@code table}: {@code ResultTable} and its plain-text, CSV, HTML and Markdown renderers.
 *   <li>{@code plot}: figures drawn with XChart ({@code MohrFigure}, {@code DirectionFigure},
 *       {@code CaseBarFigure}, {@code HistoryFigure}), each rendered to deterministic SVG and PNG.
 *   <li>{@code record}: the calculation record ({@code CalculationRecord}) as self-contained HTML
 *       and as Markdown, and {@code RecordFolder}, which writes a whole output folder.
 *   <li>{@code output}: {@code OutputTransaction} (staged writes, atomic rename, stale removal)
 *       and {@code Sha256}.
 *   <li>{@code text}: escaping for HTML and Markdown.
 * </ul>
 */
package org.rosetra.runtime.render;
