package org.assay.pdf;

import java.util.List;

/** What one page holds for table extraction: its glyphs in drawing order and its ruling lines. */
public record PageContent(int number, double width, double height, List<Glyph> glyphs, List<Rule> rules) {
    public PageContent {
        glyphs = List.copyOf(glyphs);
        rules = List.copyOf(rules);
    }

    public List<Rule> horizontalRules() { return rules.stream().filter(Rule::horizontal).toList(); }

    public List<Rule> verticalRules() { return rules.stream().filter(Rule::vertical).toList(); }
}
