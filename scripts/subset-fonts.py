"""Writes the chart fonts' subsets src/images/fonts/DejaVuSans-subset.ttf and DejaVuSans-Bold-subset.ttf from the
`dejavu-fonts-ttf` package (run from the repository root after `npm ci`; needs fontTools: pip install fonttools).

The characters are src/images/chart-font-subset.ts CHART_FONT_RANGES (keep the two lists equal; the tests check that
the subsets hold every character of that list the full fonts have, and draw it the same). Layout features are all kept
(kerning), hinting dropped (resvg does not hint). Used once, when the list changes: the subsets are committed.
"""
from fontTools import subset

RANGES = "U+0020-007E,U+00A0-00FF,U+0391-03C9,U+2010-2027,U+2030-203A,U+2070-209F,U+2190-2199,U+2200-22FF"

for name in ("DejaVuSans", "DejaVuSans-Bold"):
    options = subset.Options()
    options.layout_features = ["*"]
    options.hinting = False
    font = subset.load_font(f"node_modules/dejavu-fonts-ttf/ttf/{name}.ttf", options)
    subsetter = subset.Subsetter(options)
    subsetter.populate(unicodes=subset.parse_unicodes(RANGES))
    subsetter.subset(font)
    subset.save_font(font, f"src/images/fonts/{name}-subset.ttf", options)
