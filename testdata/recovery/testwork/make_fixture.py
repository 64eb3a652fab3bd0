"""Writes the invented recovery fixture heads.csv and smelts.csv (fixed numbers, no randomness).

Run from this folder: /usr/bin/python3 make_fixture.py
Each smelt's button grade is set so that the products hold the charge's metal times a chosen accountability.
"""
head_au, head_ag = 42.0, 120.0
heads = [("F1", 1, 42.3, 121), ("F1", 2, 41.6, 118), ("F1", 3, 42.1, 120)]
with open("heads.csv", "w") as f:
    f.write("feed,replicate,Au_g/t,Ag_g/t\n")
    for r in heads:
        f.write("%s,%d,%s,%s\n" % r)
# condition, replicate, charge g, slag g, slag Au, slag Ag, matte (g, Au, Ag) or None, accountability
smelts = [
    ("Borax 1050C", 1, 100, 262, "0.41", "4.1", None, 0.995),
    ("Borax 1050C", 2, 100, 258, "0.44", "4.4", None, 1.004),
    ("Borax 1050C", 3, 100, 265, "0.39", "3.9", None, 0.998),
    ("Borax 1100C", 1, 100, 255, "0.30", "3.2", None, 1.002),
    ("Borax 1100C", 2, 100, 260, "0.62", "4.9", None, 0.993),
    ("Borax 1100C", 3, 100, 251, "0.36", "3.5", None, 1.006),
    ("Soda-silica 1050C", 1, 100, 270, "1.12", "7.8", (6.1, "3.9", "22"), 0.990),
    ("Soda-silica 1050C", 2, 100, 274, "1.21", "8.3", (5.7, "4.4", "25"), 0.996),
    ("Soda-silica 1050C", 3, 100, 268, "1.05", "7.5", (6.4, "3.6", "21"), 1.003),
    ("Half charge", 1, 50, 132, "<0.2", "2.9", None, 1.001),
    ("Half charge", 2, 50, 129, "0.26", "3.1", None, 0.997),
]


def val(s):
    return 0.2 if s.startswith("<") else float(s)


rows = []
for i, (cond, rep, charge, slag, sau, sag, matte, acc) in enumerate(smelts, 1):
    tid = "SM-%02d" % i
    m_au = charge * head_au * 1e-6 * acc
    m_ag = charge * head_ag * 1e-6 * acc
    loss_au = slag * val(sau) * 1e-6 + (matte[0] * float(matte[1]) * 1e-6 if matte else 0)
    loss_ag = slag * val(sag) * 1e-6 + (matte[0] * float(matte[2]) * 1e-6 if matte else 0)
    button = round(0.4 * charge + (i % 3) * 0.7, 1)
    bau = (m_au - loss_au) / button * 1e6
    bag = (m_ag - loss_ag) / button * 1e6
    rows.append((tid, cond, rep, "F1", charge, "button", "collected", button, "%.1f" % bau, "%.0f" % bag))
    rows.append((tid, cond, rep, "F1", charge, "slag", "loss", slag, sau, sag))
    if matte:
        rows.append((tid, cond, rep, "F1", charge, "matte", "loss", matte[0], matte[1], matte[2]))
with open("smelts.csv", "w") as f:
    f.write("test_id,condition,replicate,feed,charge_g,product,product_role,mass_g,Au_g/t,Ag_g/t\n")
    for r in rows:
        f.write(",".join(str(x) for x in r) + "\n")
