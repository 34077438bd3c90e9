"""Subset DejaVu Sans (regular, bold) to the characters Kitwright prints and rename the family.

Run from the repository root with Debian's fontTools (apt-get install -y python3-fonttools):
    /usr/bin/python3 assets/fonts/make-subset.py
The Bitstream Vera licence (DejaVu-LICENSE.txt) asks that modified fonts be renamed to names without
"Bitstream" or "Vera"; the subset is therefore called KitwrightSans.
"""
from fontTools import subset
from fontTools.ttLib import TTFont

UNICODES = (
    list(range(0x20, 0x7F))  # Basic Latin
    + list(range(0xA0, 0x100))  # Latin-1 Supplement: ° × ± µ ² ³ ½ ¼ ¾ …
    + list(range(0x2000, 0x2070))  # General Punctuation: – — • … thin spaces
    + [0x2190, 0x2191, 0x2192, 0x2193]  # ← ↑ → ↓
    + [0x2212]  # minus sign
    + [0x2713, 0x2717]  # ✓ ✗
)
FAMILY = "KitwrightSans"
SOURCES = [("DejaVuSans.ttf", "KitwrightSans-Regular.ttf", "Regular"), ("DejaVuSans-Bold.ttf", "KitwrightSans-Bold.ttf", "Bold")]


def rename(font: TTFont, style: str) -> None:
    full = f"{FAMILY} {style}" if style != "Regular" else FAMILY
    postscript = f"{FAMILY}-{style}"
    names = {1: FAMILY, 2: style, 3: f"{postscript};subset of DejaVu Sans", 4: full, 6: postscript, 16: FAMILY, 17: style}
    table = font["name"]
    for record in list(table.names):
        if record.nameID in names:
            table.removeNames(nameID=record.nameID)
    for name_id, value in names.items():
        table.setName(value, name_id, 3, 1, 0x409)
        table.setName(value, name_id, 1, 0, 0)


for source, target, style in SOURCES:
    options = subset.Options()
    options.hinting = False
    options.layout_features = ["kern", "liga"]
    options.name_IDs = ["*"]
    options.notdef_outline = True
    font = subset.load_font(f"assets/fonts/{source}", options)
    subsetter = subset.Subsetter(options)
    subsetter.populate(unicodes=UNICODES)
    subsetter.subset(font)
    rename(font, style)
    font.save(f"assets/fonts/{target}")
    cmap = font.getBestCmap()
    missing = [hex(u) for u in UNICODES if u not in cmap and not (0x2000 <= u < 0x2070)]
    print(target, "glyphs:", len(font.getGlyphOrder()), "missing required:", missing)
