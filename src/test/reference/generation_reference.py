#!/usr/bin/python3
"""Reference values for assay's text-generation tokenizers and metrics (BLEU, sentence BLEU,
chrF/chrF++, exact match, token F1), computed with NLTK 3.8 and the Python standard library.

Run with Debian's interpreter (/usr/bin/python3; package python3-nltk). Writes
src/test/resources/reference/generation.json with the invented inputs (fixed seed) and the
expected values; the Java tests in org.assay.metrics.generation read it offline.

What is computed with what, and where it coincides with assay's definitions:

Tokenizers.
  13a   nltk.tokenize.nist.NISTTokenizer().tokenize(text, lowercase=...) (non-international mode;
        it implements the mteval-v13a rules). NLTK's class also builds character classes for its
        international mode from the 'perluniprops' data package, which Debian does not ship; this
        script stands in a placeholder for that data (the mode used here never reads it). NLTK
        diverges from the mteval rules on end-of-line hyphens ("-\n" is not joined) and on
        entities (XML unescaping: "&amp;lt;" stays "&lt;"; "&apos;", "&#124;", "&#91;", "&#93;"
        are unescaped): those texts go to "tokenizer.divergent" and are kept out of the corpora.
  none  text.split()  (Python's Unicode whitespace; "whitespace" lists every such code point).
  char  every non-whitespace character of the text (assay's definition, written here directly).
  Lower-casing is str.lower() before tokenizing (NISTTokenizer lower-cases inside, after
  unescaping, as the mteval rules do).

BLEU (nltk.translate.bleu_score, uniform weights 1/order). smoothing maps to SmoothingFunction:
  none -> method0, floor -> method1 (epsilon 0.1), add_one -> method2, exp -> method3.
  NLTK's modified_precision gives each hypothesis max(1, n-gram count) as its denominator, so its
  corpus_bleu adds 1 per hypothesis shorter than n. assay sums the true counts (Papineni et al.
  2002) and uses max(1, sum) only when the sum is 0. The "long" corpus has no hypothesis shorter
  than 4 tokens: there NLTK's corpus_bleu is the expected value (the script checks that it equals
  the summed-count value). On the "short" corpus they differ; the expected value there is
  summed_counts_bleu(): NLTK's modified_precision numerators (clipping), the true totals,
  closest_ref_length and brevity_penalty, and NLTK's own smoothing functions applied to the
  summed counts. Without smoothing NLTK's method0 turns a zero count into sys.float_info.min
  (a value near 1e-77 instead of 0); the expected value is exactly 0 there.
  sentence_bleu: the mean of nltk sentence_bleu over items. Per sentence both use max(1, count),
  so the values coincide on both corpora.

chrF. NLTK's corpus_chrf is the mean over sentences and orders of per-order F-scores; assay's
  chrF (Popovic 2015/2017) sums n-gram counts over the corpus, averages precision and recall over
  the orders, then takes one F-beta. They coincide on one sentence and one order only:
  "chrf.single_order" holds NLTK sentence_chrf(ref, hyp, min_len=n, max_len=n, beta=2) per item
  (NLTK returns 1e-16 where the F-score is 0/0; assay returns 0). "chrf.cases" holds the
  corpus value computed here from NLTK's building blocks: chrf_precision_recall_fscore_support
  gives each order's matches (its 'support'), the n-gram counts come from nltk.util.ngrams;
  counts are summed, per-order precision (orders with hypothesis n-grams) and recall (orders
  with reference n-grams) are averaged, then F-beta. NLTK's corpus_chrf of the same corpus is
  recorded as "nltk_corpus_chrf" for the difference test. Character n-grams are taken on the
  text without whitespace (NLTK's _preprocess), word n-grams on text.split(). With several
  references an item uses the reference with the best sentence chrF (the first of equals).

Exact match and token F1: the SQuAD v1.1 answer normalisation (Rajpurkar et al. 2016) written
  here from memory of its evaluation script (lower; drop string.punctuation; re.sub
  r'\\b(a|an|the)\\b' by ' '; ' '.join(split())). No library implements it in Debian; the values
  check that assay's Java code behaves as Python's str and re do on the same text.
"""
import json
import math
import os
import random
import re
import string
import sys
import unicodedata
import warnings
from collections import Counter
from fractions import Fraction

import nltk
import nltk.corpus


class _NoPerlUniprops:
    """Placeholder for NLTK's 'perluniprops' data; only NISTTokenizer.international_tokenize uses it."""

    def chars(self, category):
        return ["0"]


nltk.corpus.perluniprops = _NoPerlUniprops()

from nltk.tokenize.nist import NISTTokenizer  # noqa: E402
from nltk.translate.bleu_score import (SmoothingFunction, brevity_penalty, closest_ref_length,  # noqa: E402
                                       corpus_bleu, modified_precision, sentence_bleu)
from nltk.translate.chrf_score import chrf_precision_recall_fscore_support, corpus_chrf, sentence_chrf  # noqa: E402
from nltk.util import ngrams  # noqa: E402

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "..", "resources", "reference", "generation.json")
SEED = 7319
NIST = NISTTokenizer()
SMOOTHING = {"none": "method0", "floor": "method1", "add_one": "method2", "exp": "method3"}

# ---------------------------------------------------------------- invented texts

WORDS = ["the", "a", "an", "train", "climbs", "past", "old", "mill", "snow", "valley", "station", "at",
         "noon", "two", "blue", "carriages", "wait", "near", "bridge", "river", "is", "on", "of", "slow",
         "morning", "signal", "tunnel", "Mill", "Valley", "The", "A", "guard", "whistles", "pass"]
# Tokens with punctuation, numbers, dashes and entities (the 13a rules' cases), none of the
# forms where NLTK and the mteval rules diverge.
SPECIAL = ["3.5", "1,200", "12-14", "km", "e-mail", "&amp;", "&quot;late&quot;", "it's", "O'Neil", "$20",
           "50%", "up/down", "2024-05-17", "--", "(north)", "[east]", "{west}", "a.m.", "No.7", "x,y",
           "7-", "-9", "U.S.", "ticket#4", "@noon", "5:30", "1.", ".5", "&lt;b&gt;", "~", "^", "`", "|"]
PUNCT_AFTER = [",", ".", "!", "?", ";", ":", ")", "...", "'", "\""]


def word(rng):
    w = rng.choice(WORDS) if rng.random() < 0.8 else rng.choice(SPECIAL)
    if rng.random() < 0.15:
        w += rng.choice(PUNCT_AFTER)
    return w


def sentence(rng, length, source=None, share=0):
    out = []
    while len(out) < length:
        if source and rng.randrange(4) < share:
            start = rng.randrange(len(source))
            out.extend(source[start:start + 1 + rng.randrange(4)])
        else:
            out.append(word(rng))
    out = out[:length]
    if out and rng.random() < 0.4:
        out[-1] += "."
    spaces = [" "] * (len(out) - 1)
    if spaces and rng.random() < 0.2:
        spaces[rng.randrange(len(spaces))] = rng.choice(["  ", "\t", "\u00a0", "\u3000"])
    return "".join(w + s for w, s in zip(out, spaces + [""]))


def corpus(rng, items, min_words, max_words, max_refs, prefix):
    out = []
    for i in range(items):
        h = sentence(rng, rng.randint(min_words, max_words))
        words = h.split()
        refs = [sentence(rng, rng.randint(3, 14), words, rng.randrange(4) if words else 0)
                for _ in range(rng.randint(1, max_refs))]
        out.append({"id": f"{prefix}{i}", "hypothesis": h, "references": refs})
    return out


TOKENIZER_TEXTS = [
    "Good muffins cost $3.88 in New York.",
    "The 2 trains (blue & red) left at 5:30, 6:45 and 7:10.",
    "Prices rose 3.5% -- from $1,200.50 to $1,242.",
    "Pages 12-14 of the 2024-05 report; see No.7 again...",
    "She said &quot;stop!&quot; and left &amp; came back.",
    "a<b>c &lt;tag&gt; <skipped> done",
    "e-mail me at guard@valley.example, or call 555-0100.",
    "It's O'Neil's turn: x,y and 3,4 and 5.6.7.",
    "Ends with a dash- and a digit dash 9-",
    "Mixed CASE Words, Éclair and ÜBER café.",
    "{braces} [brackets] ~tilde ^caret `tick` |bar| _under_",
    "1.5.2019 or 1. 5. 2019? .5 and 5. too",
    "  leading and trailing spaces  ",
    "tabs\tand\u00a0no-break\u3000ideographic spaces",
    "Numbers: -3, +4, 10-20, 3-D, A-4, 4-A.",
    "Quote 'single' and \"double\" marks; semi;colon",
    "URL http://example.org/a/b?c=d&e=f#g",
    "Comma,no space.Period no space",
    "",
    "...",
    "&amp;&amp; &quot;&quot; &gt;&lt;",
]
DIVERGENT_TEXTS = [
    "&amp;lt;b&amp;gt; is escaped twice",
    "it&apos;s here",
    "a &#124; b &#91;c&#93;",
    "a co-\noperative line break",
]

# ---------------------------------------------------------------- tokenizers


def tokens(text, tokenize, lowercase):
    if tokenize == "13a":
        return NIST.tokenize(text, lowercase=lowercase)
    t = text.lower() if lowercase else text
    if tokenize == "none":
        return t.split()
    return [c for c in t if not c.isspace()]


# ---------------------------------------------------------------- BLEU


def nltk_smoothing(name):
    return getattr(SmoothingFunction(), SMOOTHING[name])


def summed_counts_bleu(refs_tok, hyps_tok, order, smoothing):
    """Corpus BLEU from true summed counts, with NLTK's clipping, length and smoothing functions."""
    num, den = Counter(), Counter()
    c = r = 0
    for refs, hyp in zip(refs_tok, hyps_tok):
        for n in range(1, order + 1):
            num[n] += modified_precision(refs, hyp, n).numerator
            den[n] += max(0, len(hyp) - n + 1)
        c += len(hyp)
        r += closest_ref_length(refs, len(hyp))
    if num[1] == 0:
        return 0.0
    if smoothing == "none" and any(num[n] == 0 for n in range(1, order + 1)):
        return 0.0
    p_n = [Fraction(num[n], max(1, den[n]), _normalize=False) for n in range(1, order + 1)]
    p_n = nltk_smoothing(smoothing)(p_n, references=None, hypothesis=None, hyp_len=c)
    return brevity_penalty(r, c) * math.exp(math.fsum(math.log(p) / order for p in p_n if p > 0))


def bleu_cases(name, items):
    out, sentence_out = [], []
    settings = []
    for tokenize in ("13a", "none", "char"):
        for lowercase in (False, True):
            if tokenize != "13a" and lowercase:
                continue
            for smoothing in SMOOTHING:
                settings.append((tokenize, lowercase, smoothing, 4))
    settings += [("13a", False, "none", 2), ("13a", True, "exp", 3), ("none", False, "floor", 1)]
    for tokenize, lowercase, smoothing, order in settings:
        hyps = [tokens(it["hypothesis"], tokenize, lowercase) for it in items]
        refs = [[tokens(r, tokenize, lowercase) for r in it["references"]] for it in items]
        weights = tuple([1.0 / order] * order)
        with warnings.catch_warnings():
            warnings.simplefilter("ignore")
            nltk_value = float(corpus_bleu(refs, hyps, weights=weights, smoothing_function=nltk_smoothing(smoothing)))
            per_item = [float(sentence_bleu(r, h, weights=weights, smoothing_function=nltk_smoothing(smoothing)))
                        for r, h in zip(refs, hyps)]
        summed = summed_counts_bleu(refs, hyps, order, smoothing)
        coincides = all(len(h) >= order for h in hyps)
        if coincides and not (smoothing == "none" and summed == 0.0):
            assert abs(summed - nltk_value) < 1e-12, (name, tokenize, smoothing, summed, nltk_value)
        params = {"tokenize": tokenize, "lowercase": str(lowercase).lower(), "smoothing": smoothing,
                  "order": str(order)}
        out.append({"corpus": name, "params": params, "expected": summed, "nltk_corpus_bleu": nltk_value,
                    "nltk_coincides": coincides})
        sentence_out.append({"corpus": name, "params": params, "expected": sum(per_item) / len(per_item),
                             "per_item": per_item})
    return out, sentence_out


# ---------------------------------------------------------------- chrF


def chrf_counts(hyp, ref, char_order, word_order, lowercase):
    """Per order (characters 1..char_order, then words 1..word_order): [matches, hyp n-grams, ref n-grams]."""
    if lowercase:
        hyp, ref = hyp.lower(), ref.lower()
    hc, rc = re.sub(r"\s+", "", hyp), re.sub(r"\s+", "", ref)
    hw, rw = hyp.split(), ref.split()
    rows = []
    for seq_h, seq_r, top in ((hc, rc, char_order), (hw, rw, word_order)):
        for n in range(1, top + 1):
            tp = chrf_precision_recall_fscore_support(seq_r, seq_h, n, beta=2)[3]
            rows.append([tp, sum(1 for _ in ngrams(seq_h, n)), sum(1 for _ in ngrams(seq_r, n))])
    return rows


def popovic_chrf(rows, beta):
    """F-beta of precision and recall averaged over the orders (summed counts per order)."""
    precisions = [m / h for m, h, r in rows if h > 0]
    recalls = [m / r for m, h, r in rows if r > 0]
    p = sum(precisions) / len(precisions) if precisions else 0.0
    rec = sum(recalls) / len(recalls) if recalls else 0.0
    if p == 0 and rec == 0:
        return 0.0
    return (1 + beta ** 2) * p * rec / (beta ** 2 * p + rec)


def corpus_popovic_chrf(items, char_order, word_order, beta, lowercase):
    total = None
    for it in items:
        best, best_value = None, -1.0
        for ref in it["references"]:
            rows = chrf_counts(it["hypothesis"], ref, char_order, word_order, lowercase)
            v = popovic_chrf(rows, beta)
            if v > best_value:
                best, best_value = rows, v
        total = best if total is None else [[a + b for a, b in zip(x, y)] for x, y in zip(total, best)]
    return popovic_chrf(total, beta)


def chrf_section(single, multi):
    cases = []
    for char_order, word_order, beta, lowercase in ((6, 0, 2.0, False), (6, 2, 2.0, False), (6, 0, 1.0, False),
                                                    (4, 0, 3.0, False), (6, 2, 2.0, True), (1, 0, 2.0, False),
                                                    (0, 2, 2.0, False)):
        params = {"char_order": str(char_order), "word_order": str(word_order), "beta": str(beta),
                  "lowercase": str(lowercase).lower()}
        for name, items in (("chrf_single", single), ("chrf_multi", multi)):
            cases.append({"corpus": name, "params": params,
                          "expected": corpus_popovic_chrf(items, char_order, word_order, beta, lowercase)})
    refs = [it["references"][0] for it in single]
    hyps = [it["hypothesis"] for it in single]
    nltk_corpus = float(corpus_chrf(refs, hyps, min_len=1, max_len=6, beta=2.0))
    per_order = []
    for it in single:
        ref, hyp = it["references"][0], it["hypothesis"]
        per_order.append({
            "sentence_chrf": [float(sentence_chrf(ref, hyp, min_len=n, max_len=n, beta=2.0)) for n in range(1, 7)],
            "counts": chrf_counts(hyp, ref, 6, 2, False),
        })
    one = single[0]
    return {
        "cases": cases,
        "nltk_corpus_chrf": {"corpus": "chrf_single", "params": {"char_order": "6", "word_order": "0", "beta": "2"},
                             "nltk": nltk_corpus},
        "single_order": per_order,
        "one_sentence_one_order": {"hypothesis": one["hypothesis"], "reference": one["references"][0],
                                   "nltk_sentence_chrf_order1": float(sentence_chrf(one["references"][0],
                                                                                     one["hypothesis"], 1, 1, 2.0))},
    }


# ---------------------------------------------------------------- answers (SQuAD convention)


def normalize_answer(s):
    s = s.lower()
    s = "".join(ch for ch in s if ch not in set(string.punctuation))
    s = re.sub(r"\b(a|an|the)\b", " ", s)
    return " ".join(s.split())


def token_f1(prediction, answer):
    p, a = normalize_answer(prediction).split(), normalize_answer(answer).split()
    common = sum((Counter(p) & Counter(a)).values())
    if common == 0:
        return 0.0
    precision, recall = common / len(p), common / len(a)
    return 2 * precision * recall / (precision + recall)


ANSWER_TEXTS = [
    "The Blue Train", "blue train.", "  an   old mill ", "A mill, an old one!", "theory of the anthem",
    "the’s", "Thé café", "the_train", "a\u0301 the", "(the) [a] {an}", "Mill-Valley", "O'Neil's",
    "THE", "", "5.30 p.m.", "½ the way", "Ⅻ a", "the\u00a0end", "ΣΊΣΥΦΟΣ", "a‿the",
]


def answers_section(rng):
    items = []
    pool = ["the blue train", "Blue train", "an old mill", "old mill!", "the river", "River.", "two carriages",
            "2 carriages", "at noon", "noon", "the snow valley", "Snow Valley", "a signal", "the Signal?", ""]
    for i in range(24):
        h = rng.choice(pool)
        refs = [rng.choice(pool[:-1]) for _ in range(rng.randint(1, 3))]
        if rng.random() < 0.3:
            refs[rng.randrange(len(refs))] = h.upper() + rng.choice(["", ".", " !"]) if h else "x"
        items.append({"id": f"q{i}", "hypothesis": h, "references": refs})
    em = sum(1 for it in items if any(normalize_answer(it["hypothesis"]) == normalize_answer(r)
                                      for r in it["references"]))
    em_raw = sum(1 for it in items if it["hypothesis"] in it["references"])
    f1 = [max(token_f1(it["hypothesis"], r) for r in it["references"]) for it in items]
    f1_raw = []
    for it in items:
        best = 0.0
        for r in it["references"]:
            p, a = it["hypothesis"].split(), r.split()
            common = sum((Counter(p) & Counter(a)).values())
            if common:
                best = max(best, 2 * (common / len(p)) * (common / len(a)) / (common / len(p) + common / len(a)))
        f1_raw.append(best)
    return {
        "normalized": [{"text": t, "normalized": normalize_answer(t)} for t in ANSWER_TEXTS],
        "items": items,
        "exact_match": {"normalize": em, "raw": em_raw, "items": len(items)},
        "token_f1": {"normalize": sum(f1) / len(f1), "raw": sum(f1_raw) / len(f1_raw)},
    }


# ---------------------------------------------------------------- main


def ranges(predicate):
    out, start = [], None
    for cp in range(0x110000):
        if predicate(cp):
            if start is None:
                start = cp
        elif start is not None:
            out.append([start, cp - 1])
            start = None
    if start is not None:
        out.append([start, 0x10FFFF])
    return out


def main():
    rng = random.Random(SEED)
    long_items = corpus(rng, 30, 4, 16, 3, "L")
    short_items = corpus(rng, 14, 0, 3, 2, "S")
    short_items[0]["hypothesis"] = ""
    # A corpus with unigram and bigram matches but no 4-gram match at all.
    zero_items = [{"id": "Z0", "hypothesis": "snow on the old mill", "references": ["the old snow on a mill"]},
                  {"id": "Z1", "hypothesis": "two blue carriages wait", "references": ["blue carriages , two wait"]}]
    chrf_single = corpus(rng, 20, 1, 14, 1, "C")
    chrf_single[3]["hypothesis"] = "ab"   # shorter than most character orders
    chrf_multi = corpus(rng, 20, 1, 14, 3, "M")

    bleu, sentence = [], []
    for name, items in (("long", long_items), ("short", short_items), ("zero_order", zero_items)):
        b, s = bleu_cases(name, items)
        bleu += b
        sentence += s
    assert all(len(tokens(it["hypothesis"], "13a", False)) >= 4 for it in long_items)

    tokenizer_cases = []
    texts = TOKENIZER_TEXTS + [t for c in (long_items, short_items, chrf_single) for it in c
                               for t in [it["hypothesis"]] + it["references"]]
    for text in texts:
        for lowercase in (False, True):
            tokenizer_cases.append({"text": text, "lowercase": lowercase, "nltk": NIST.tokenize(text, lowercase=lowercase)})

    doc = {
        "generated_by": {
            "script": "src/test/reference/generation_reference.py",
            "python": sys.version.split()[0],
            "nltk": nltk.__version__,
            "unicodedata": unicodedata.unidata_version,
            "seed": SEED,
        },
        "whitespace": [cp for cp in range(0x110000) if chr(cp).isspace()],
        "word_characters": ranges(lambda cp: re.match(r"\w", chr(cp)) is not None),
        "tokenizer": {
            "cases": tokenizer_cases,
            "divergent": [{"text": t, "nltk": NIST.tokenize(t)} for t in DIVERGENT_TEXTS],
        },
        "corpora": {"long": long_items, "short": short_items, "zero_order": zero_items,
                    "chrf_single": chrf_single, "chrf_multi": chrf_multi},
        "bleu": bleu,
        "sentence_bleu": sentence,
        "chrf": chrf_section(chrf_single, chrf_multi),
        "answers": answers_section(rng),
    }
    with open(OUT, "w", encoding="utf-8") as f:
        json.dump(doc, f, indent=1, ensure_ascii=False)
        f.write("\n")
    print(f"python {doc['generated_by']['python']}, nltk {nltk.__version__}; wrote {os.path.relpath(OUT)}")


if __name__ == "__main__":
    main()
