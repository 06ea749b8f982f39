/**
 * The run's report: {@code result.json}, {@code result.csv} and a self-contained, escaped
 * {@code report.html} with annotated pictures and inline SVG charts. Every file is written under a
 * temporary name and moved into place, the HTML last.
 */
@NullMarked
package dev.wavemark.report;

import org.jspecify.annotations.NullMarked;
