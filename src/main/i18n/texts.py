# Every text but the letters' in the three languages (window, checks, charts, record, import, command line).
# Reads src/main/i18n/texts/*.tsv (one text a line: key, English, Spanish, Portuguese, separated by tabs;
# a line starting with # is a comment) and writes every key but the letter.* ones (src/main/i18n/letters.py)
# of src/main/resources/org/shapetrail/i18n/messages*.properties. Write apostrophes plainly: they are
# doubled here for MessageFormat. A Spanish or Portuguese text ending in " (review)" holds a term a native
# practitioner should check (docs/languages.md); the mark is taken off before writing.
import glob, os
here = os.path.dirname(os.path.abspath(__file__))
root = os.path.join(here, "..", "resources", "org", "shapetrail", "i18n")
rows, seen = [], {}
for tsv in sorted(glob.glob(os.path.join(here, "texts", "*.tsv"))):
    rows.append(("#", os.path.basename(tsv)))
    for n, line in enumerate(open(tsv, encoding="utf-8").read().splitlines(), 1):
        if not line.strip() or line.startswith("#"):
            continue
        cells = line.split("\t")
        assert len(cells) == 4, "%s:%d: key, en, es, pt separated by tabs, not %d cells" % (tsv, n, len(cells))
        key = cells[0].strip()
        assert key not in seen, "%s:%d: %s is also at %s" % (tsv, n, key, seen[key])
        assert not key.startswith("letter."), key
        seen[key] = "%s:%d" % (os.path.basename(tsv), n)
        rows.append((key, [c.rstrip("\r").removesuffix(" (review)").replace("\\n", "\n") for c in cells[1:]]))
def picocli(key):
    # the command line's help: picocli reads these itself as String.format patterns, not MessageFormat
    # (the qualified ones start with "shapetrail.", the shared options' keys have no dot at all)
    return key.startswith("shapetrail.") or key.startswith("usage.") or "." not in key
def esc(v, key=""):
    v = v if picocli(key) else v.replace("'", "''")
    v = v.replace("\\", "\\\\").replace("\n", "\\n")
    return "\\" + v if v.startswith(" ") else v  # a properties value keeps a leading space only escaped
for i, suffix in enumerate(("", "_es", "_pt")):
    path = os.path.join(root, "messages" + suffix + ".properties")
    letters = [l for l in open(path, encoding="utf-8").read().splitlines()
               if l.startswith("letter.") or l.startswith("# letters")]
    out = ["# window, charts and checks (written by src/main/i18n/texts.py)"]
    for key, texts in rows:
        out.append("# " + texts if key == "#" else key + " = " + esc(texts[i], key))
    open(path, "w", encoding="utf-8").write("\n".join(out + [""] + letters) + "\n")
print("wrote", len(seen), "keys in 3 languages")
