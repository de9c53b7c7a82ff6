/**
 * The report of a worksheet: one self-contained HTML file ({@link org.ampturn.report.HtmlReport})
 * with the cautions that apply ({@link org.ampturn.report.Cautions}; their thresholds are common
 * practice, named there) and the statement that results defer to local codes and licensed
 * practice. It reads the worksheet document ({@code org.ampturn.worksheet}); the worksheet never
 * sees it. Null is not accepted unless a parameter says so.
 */
package org.ampturn.report;
