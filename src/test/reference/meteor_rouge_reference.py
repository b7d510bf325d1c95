#!/usr/bin/python3
"""Reference values for assay's ROUGE and METEOR, computed independently of the Java code.

Run with Debian's interpreter (/usr/bin/python3; packages python3-nltk 3.8 and wordnet-base
3.0). Writes src/test/resources/reference/meteor_rouge.json, which the tests in
org.assay.metrics.generation read offline. The sentences are invented here, from a fixed seed.

ROUGE (Lin 2004, "ROUGE: A Package for Automatic Evaluation of Summaries"), written in this
script from the paper's definitions:
  tokens     the text lower-cased (str.lower; unless lowercase is false), then maximal runs of
             characters that are letters (str.isalpha) or decimal digits (Unicode category Nd);
             everything else separates. With stem, each token becomes
             PorterStemmer(mode=ORIGINAL_ALGORITHM).stem(token) (NLTK).
  ROUGE-N    n-grams by nltk.util.ngrams; overlap = sum over n-grams of min(count in hypothesis,
             count in reference); P = overlap / hypothesis n-grams, R = overlap / reference n-grams
  ROUGE-L    LCS = longest common subsequence length by the textbook dynamic programme (full
             table); P = LCS / hypothesis tokens, R = LCS / reference tokens
  F          2 P R / (P + R) (beta = 1); a ratio with a zero denominator is 0, F is 0 when P + R = 0
  item       the maximum over the item's references of the chosen measure (f, precision, recall)
  corpus     the mean of the item scores

METEOR: nltk.translate.meteor_score.meteor_score(references, hypothesis, stemmer, wordnet,
alpha, beta, gamma) with the texts split on whitespace (str.split), the stemmer
PorterStemmer(mode=PorterStemmer.ORIGINAL_ALGORITHM) (the Java side uses Snowball's porter, the
original algorithm; NLTK's default PorterStemmer() runs in NLTK_EXTENSIONS mode, recorded
separately below), and WordNet 3.0 read by nltk.corpus.reader.wordnet.WordNetCorpusReader from
a copy of /usr/share/wordnet. Debian's wordnet-base lacks the 'lexnames' file the reader needs;
it is written into the copy from the table in the lexnames(5WN) man page. The corpus value is
the mean of the item scores.

Also recorded: NLTK's synonym sets as meteor_score builds them (lemma names without '_' of
wordnet.synsets(word), plus the word) and NLTK's morphy base forms (WordNetCorpusReader._morphy)
for a list of words, and the Porter stems of a word list in both NLTK modes.
"""
import gzip
import json
import os
import platform
import random
import re
import shutil
import subprocess
import tempfile
import unicodedata
import warnings
from collections import Counter

import nltk
from nltk.corpus.reader.wordnet import WordNetCorpusReader
from nltk.stem.porter import PorterStemmer
from nltk.translate.meteor_score import meteor_score
from nltk.util import ngrams

# Reading WordNet without the Open Multilingual Wordnet (not needed here) makes NLTK warn.
warnings.filterwarnings("ignore", message="The multilingual functions are not available")

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "..", "resources", "reference", "meteor_rouge.json")
WORDNET_DIR = "/usr/share/wordnet"
LEXNAMES_MAN = "/usr/share/man/man5/lexnames.5WN.gz"
SEED = 20261202

ORIGINAL = PorterStemmer(mode=PorterStemmer.ORIGINAL_ALGORITHM)
NLTK_DEFAULT = PorterStemmer()  # NLTK_EXTENSIONS mode, meteor_score's default stemmer


# ---------------------------------------------------------------- WordNet

def wordnet_reader(tmp):
    """A WordNetCorpusReader over a copy of Debian's WordNet 3.0 with a lexnames file added."""
    root = os.path.join(tmp, "wordnet")
    shutil.copytree(WORDNET_DIR, root)
    with gzip.open(LEXNAMES_MAN, "rt", encoding="utf-8") as f:
        man = f.read()
    rows = re.findall(r"^(\d\d)\t(\S+)\s", man, re.M)
    assert [int(n) for n, _ in rows] == list(range(45)), rows
    category = {"noun": 1, "verb": 2, "adj": 3, "adv": 4}
    with open(os.path.join(root, "lexnames"), "w", encoding="utf-8") as f:
        for number, name in rows:
            f.write(f"{number}\t{name}\t{category[name.split('.')[0]]}\n")
    return WordNetCorpusReader(root, None)


def synonyms(wn, word):
    """The set meteor_score's _enum_wordnetsyn_match builds for a hypothesis word."""
    names = {lemma.name() for synset in wn.synsets(word) for lemma in synset.lemmas()
             if lemma.name().find("_") < 0}
    return sorted(names | {word})


# ---------------------------------------------------------------- ROUGE

def rouge_tokens(text, lowercase, stem):
    t = text.lower() if lowercase else text
    tokens, current = [], []
    for ch in t:
        if ch.isalpha() or unicodedata.category(ch) == "Nd":
            current.append(ch)
        elif current:
            tokens.append("".join(current))
            current = []
    if current:
        tokens.append("".join(current))
    return [ORIGINAL.stem(w.lower()) for w in tokens] if stem else tokens


def measure(overlap, hyp_len, ref_len, which):
    p = overlap / hyp_len if hyp_len else 0.0
    r = overlap / ref_len if ref_len else 0.0
    if which == "precision":
        return p
    if which == "recall":
        return r
    return 2 * p * r / (p + r) if p + r > 0 else 0.0


def rouge_n(hyp, ref, n, which):
    h, r = Counter(ngrams(hyp, n)), Counter(ngrams(ref, n))
    return measure(sum((h & r).values()), sum(h.values()), sum(r.values()), which)


def lcs(a, b):
    table = [[0] * (len(b) + 1) for _ in range(len(a) + 1)]
    for i in range(1, len(a) + 1):
        for j in range(1, len(b) + 1):
            if a[i - 1] == b[j - 1]:
                table[i][j] = table[i - 1][j - 1] + 1
            else:
                table[i][j] = max(table[i - 1][j], table[i][j - 1])
    return table[len(a)][len(b)]


def rouge_l(hyp, ref, which):
    return measure(lcs(hyp, ref), len(hyp), len(ref), which)


def rouge_case(name, items, stem, lowercase, which):
    per = {"rouge_1": [], "rouge_2": [], "rouge_l": []}
    for hyp_text, refs in items:
        hyp = rouge_tokens(hyp_text, lowercase, stem)
        ref_tokens = [rouge_tokens(r, lowercase, stem) for r in refs]
        per["rouge_1"].append(max(rouge_n(hyp, r, 1, which) for r in ref_tokens))
        per["rouge_2"].append(max(rouge_n(hyp, r, 2, which) for r in ref_tokens))
        per["rouge_l"].append(max(rouge_l(hyp, r, which) for r in ref_tokens))
    params = {"measure": which, "stem": str(stem).lower(), "lowercase": str(lowercase).lower()}
    return {"name": name, "params": params,
            "hypotheses": [h for h, _ in items], "references": [r for _, r in items],
            "per_item": per, "corpus": {k: sum(v) / len(v) for k, v in per.items()}}


# ---------------------------------------------------------------- METEOR

def meteor_case(name, items, wn, alpha, beta, gamma, stemmer=ORIGINAL):
    per = [meteor_score([r.split() for r in refs], hyp.split(), stemmer=stemmer, wordnet=wn,
                        alpha=alpha, beta=beta, gamma=gamma) for hyp, refs in items]
    return {"name": name, "params": {"alpha": alpha, "beta": beta, "gamma": gamma},
            "hypotheses": [h for h, _ in items], "references": [r for _, r in items],
            "per_item": per, "corpus": sum(per) / len(per)}


# ---------------------------------------------------------------- invented corpus

# Each slot lists interchangeable forms: inflections, WordNet synonyms and near-synonyms, case.
SLOTS = [
    ["boat", "boats", "ship", "ships", "vessel", "Boat", "craft"],
    ["big", "large", "huge", "Large", "bigger", "largest"],
    ["small", "little", "tiny", "smaller"],
    ["sail", "sails", "sailed", "sailing"],
    ["start", "starts", "started", "begin", "began", "begins", "starting"],
    ["quick", "fast", "quickly", "rapid", "speedy"],
    ["harbour", "harbor", "port", "haven", "harbours"],
    ["car", "cars", "auto", "automobile"],
    ["child", "children", "kid", "kids", "Children"],
    ["buy", "bought", "purchase", "purchased", "buys"],
    ["run", "ran", "running", "runs"],
    ["goose", "geese", "Geese"],
    ["sea", "ocean", "seas", "oceans"],
    ["dog", "dogs", "hound", "hounds"],
    ["wind", "winds", "breeze", "gale"],
    ["crane", "cranes", "hoist"],
    ["stop", "stopped", "stopping", "halt", "halted"],
    ["look", "looked", "see", "saw", "watch", "watched", "watching"],
    ["quay", "quays", "wharf", "pier", "dock", "docks"],
    ["leave", "leaves", "left", "depart", "departed"],
    ["gull", "gulls", "seagull", "seagulls"],
    ["night", "nights", "dusk", "evening", "evenings"],
]
FUNCTION_WORDS = ["the", "a", "at", "on", "of", "two", "near", "and", "is", "was", "were", "by", "in", "the"]
EXTRA_TOKENS = ["café", "Zürich", "naïve", "2024", "3rd", "it's", "well-known", "x-ray"]


def sentence_plan(rng):
    plan = []
    for _ in range(rng.randint(3, 11)):
        plan.append(("slot", rng.randrange(len(SLOTS))) if rng.random() < 0.55
                    else ("word", rng.choice(FUNCTION_WORDS)))
    return plan


def realise(rng, plan, noise):
    words = []
    for kind, value in plan:
        if rng.random() < noise * 0.3:
            continue  # dropped
        words.append(rng.choice(SLOTS[value]) if kind == "slot" else value)
        if rng.random() < noise * 0.15:
            words.append(rng.choice(FUNCTION_WORDS + EXTRA_TOKENS))  # inserted
    for i in range(len(words) - 1):
        if rng.random() < noise * 0.2:
            words[i], words[i + 1] = words[i + 1], words[i]
    if words and rng.random() < 0.3:
        words[0] = words[0][:1].upper() + words[0][1:]
    if words and rng.random() < 0.3:
        words[-1] += rng.choice([".", ",", "!"])
    return " ".join(words)


def corpus(rng, items):
    out = []
    for _ in range(items):
        plan = sentence_plan(rng)
        hyp = realise(rng, plan, 0.6)
        refs = [realise(rng, plan, rng.choice([0.2, 0.5, 0.9])) for _ in range(rng.randint(1, 3))]
        out.append((hyp, refs))
    return out


SPECIAL_ITEMS = [
    ("", ["the boat sails at dusk"]),                          # empty hypothesis
    ("... !", ["two gulls over the water"]),                  # punctuation only
    ("the boat sails at dusk", ["the boat sails at dusk"]),    # identical
    ("crane quay harbour", ["gull evening sea"]),              # nothing shared
    ("the the the the boat", ["the boat and the crane"]),     # repeated words, clipped counts
    ("boat", ["boat", "the boat"]),                            # one word: no bigrams
    ("ships sailed", ["the ship sails", "a vessel"]),          # inflections, several references
    ("The BOAT Sails", ["the boat sails"]),                    # case differences
    ("big boat", ["large boat"]),                              # a WordNet synonym pair
    ("start the car", ["begin the automobile"]),               # synonyms
]

# METEOR with NLTK's default stemmer (NLTK_EXTENSIONS) differs: "dying" -> "die" there,
# "dy" in the original algorithm; likewise "lying", "dies".
DEFAULT_STEMMER_ITEMS = [
    ("the old dog is dying at the quay", ["the old dog will die at the quay"]),
    ("two gulls lying on the pier", ["two gulls lie on the pier"]),
    ("the wind dies at dusk", ["the wind died at dusk", "wind die at dusk"]),
]

# Words where Snowball's porter and NLTK's ORIGINAL_ALGORITHM were found to disagree, by stemming
# every word of WordNet 3.0's index and exception lists (split at '_' and '-') and their -s, -ed,
# -ing, -ly, -ness, -ational and -ization forms (734,306 words) with both: all are double c, j, k,
# v, w, x or y before -ed / -ing, which the paper undoubles and Snowball's porter.sbl does not.
PORTER_DISAGREEMENTS = [
    "acced", "accing", "chivved", "chivveds", "chivving", "chivvings", "ecced", "eccing", "groznyyed",
    "groznyying", "hajjed", "hajjing", "icced", "iccing", "ilxxed", "ilxxing", "ilxxxed", "ilxxxing",
    "iwwed", "iwwing", "revved", "revveds", "revving", "revvings", "trekked", "trekkeds", "trekking",
    "trekkings", "vioxxed", "vioxxing", "xyyed", "xyying", "yakked", "yakkeds", "yakking", "yakkings",
]

# Examples of each step of Porter (1980), from memory of the paper's tables, and short words.
PORTER_CLASSIC = [
    "caresses", "ponies", "ties", "caress", "cats", "feed", "agreed", "plastered", "bled", "motoring",
    "sing", "conflated", "troubled", "sized", "hopping", "tanned", "falling", "hissing", "fizzed",
    "failing", "filing", "happy", "sky", "relational", "conditional", "rational", "valenci",
    "hesitanci", "digitizer", "conformabli", "radicalli", "differentli", "vileli", "analogousli",
    "vietnamization", "predication", "operator", "feudalism", "decisiveness", "hopefulness",
    "callousness", "formaliti", "sensitiviti", "sensibiliti", "triplicate", "formative", "formalize",
    "electriciti", "electrical", "hopeful", "goodness", "revival", "allowance", "inference", "airliner",
    "gyroscopic", "adjustable", "defensible", "irritant", "replacement", "adjustment", "dependent",
    "adoption", "homologou", "communism", "activate", "angulariti", "homologous", "effective",
    "bowdlerize", "probate", "rate", "cease", "controll", "roll", "generalizations", "oscillators",
    "a", "is", "as", "us", "ox", "dying", "lying", "dies", "skies", "news", "innings", "proceed",
]


def porter_words(wn_root, rng):
    """The classic examples, the disagreements and a seeded sample of WordNet words and forms."""
    words = set()
    for pos in ("noun", "verb", "adj", "adv"):
        with open(os.path.join(wn_root, "index." + pos), encoding="utf-8") as f:
            for line in f:
                if not line.startswith(" "):
                    words.update(w for w in re.split(r"[_\-]", line.split()[0]) if w.isalpha())
    pool = sorted(words)
    sample = rng.sample(pool, 1500)
    forms = [w + suffix for w in rng.sample(pool, 500) for suffix in ("s", "ed", "ing", "ly", "ness")]
    return sorted(set(PORTER_CLASSIC + PORTER_DISAGREEMENTS + sample + forms))


def wordnet_words(wn, items, rng):
    """Words whose synonym sets and base forms the Java side must reproduce."""
    special = ["axes", "geese", "mice", "ran", "better", "best", "was", "leaves", "wolves", "churches",
               "boxes", "women", "ladies", "fishing", "shipped", "stopping", "involucra", "aurar",
               "offer", "galore", "outback", "china", "august", "turkey", "mercury", "ice_cream",
               "ssssssssssss", "ss", "s", "boat", "ship", "vessel", "big", "large", "larg", "begin",
               "start", "car", "auto", "purchas", "buy", "quick", "fast", "harbour", "port", "haven",
               "children", "kid", "gale", "hoist", "halt", "wharf", "pier", "dock", "depart", "dusk"]
    stems = {ORIGINAL.stem(w.lower()) for hyp, refs in items for text in [hyp] + refs for w in text.split()}
    lemmas = sorted(wn._lemma_pos_offset_map.keys())
    sample = rng.sample([w for w in lemmas if "_" not in w], 600)
    inflected = [w + s for w in rng.sample([w for w in lemmas if w.isalpha()], 200)
                 for s in ("s", "es", "ed", "ing", "er", "est")]
    return sorted(set(special) | stems | set(sample) | set(inflected))


def main():
    for needed in (WORDNET_DIR, LEXNAMES_MAN):
        if not os.path.exists(needed):
            # reported like a missing Python module, so regenerate.sh skips this script
            raise ImportError(f"{needed} is missing: install Debian's wordnet-base and wordnet packages")
    rng = random.Random(SEED)
    items = corpus(rng, 80) + SPECIAL_ITEMS
    with tempfile.TemporaryDirectory() as tmp:
        wn = wordnet_reader(tmp)
        rouge = [
            rouge_case("f, no stemming", items, False, True, "f"),
            rouge_case("f, stemming", items, True, True, "f"),
            rouge_case("precision, stemming", items, True, True, "precision"),
            rouge_case("recall, no stemming", items, False, True, "recall"),
            rouge_case("f, case kept", items, False, False, "f"),
        ]
        meteor = [
            meteor_case("defaults", items, wn, 0.9, 3.0, 0.5),
            meteor_case("alpha 0.8, beta 2, gamma 0.4", items, wn, 0.8, 2.0, 0.4),
        ]
        differs = meteor_case("NLTK default stemmer", DEFAULT_STEMMER_ITEMS, wn, 0.9, 3.0, 0.5)
        differs["per_item_nltk_default_stemmer"] = meteor_case(
            "", DEFAULT_STEMMER_ITEMS, wn, 0.9, 3.0, 0.5, stemmer=NLTK_DEFAULT)["per_item"]
        words = wordnet_words(wn, items, rng)
        wordnet = {w: {"synonyms": synonyms(wn, w),
                       "base_forms": {pos: wn._morphy(w, pos) for pos in ("n", "v", "a", "r")}}
                   for w in words}
        stems_words = porter_words(WORDNET_DIR, rng)
    try:
        debian = subprocess.run(["dpkg-query", "-W", "-f=${Version}", "wordnet-base"],
                                capture_output=True, text=True, check=True).stdout
    except (OSError, subprocess.CalledProcessError):
        debian = "unknown"
    doc = {
        "generated_by": f"nltk {nltk.__version__} (nltk.translate.meteor_score, nltk.util.ngrams, "
                        f"nltk.stem.porter ORIGINAL_ALGORITHM), WordNet 3.0 from Debian wordnet-base {debian}, "
                        f"Python {platform.python_version()}",
        "script": "src/test/reference/meteor_rouge_reference.py",
        "seed": SEED,
        "rouge": rouge,
        "meteor": meteor,
        "meteor_default_stemmer": differs,
        "wordnet": wordnet,
        "porter": {
            "disagreements": PORTER_DISAGREEMENTS,
            "words": stems_words,
            "original": [ORIGINAL.stem(w) for w in stems_words],
            "nltk_default": [NLTK_DEFAULT.stem(w) for w in stems_words],
        },
    }
    with open(OUT, "w", encoding="utf-8") as f:
        json.dump(doc, f, indent=1, ensure_ascii=False, allow_nan=False)
        f.write("\n")
    print(doc["generated_by"])


if __name__ == "__main__":
    main()
