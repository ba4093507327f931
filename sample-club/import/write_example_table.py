# Writes one demo match as an invented table layout that no shipped profile reads, for the mapping
# assistant's walk-through (docs/import.md), its test and its screenshot. Run from the top folder:
#   /usr/bin/python3 sample-club/import/write_example_table.py sample-club/matches/KB-2026-01.json \
#       "sample-club/import/2026-08-08 Nettleby Town.csv"
import csv, json, sys
d = json.load(open(sys.argv[1]))
m = d['match']
words = {'pass': 'Pass', 'carry': 'Carry', 'take_on': 'Dribble', 'shot': 'Shot', 'recovery': 'Regain',
         'interception': 'Interception', 'tackle': 'Tackle', 'keeper': 'Keeper', 'clearance': 'Clearance',
         'block': 'Block', 'foul': 'Foul', 'out': 'Out'}
results = {'ok': 'Success', 'fail': 'Failure', 'goal': 'Goal', 'saved': 'Saved', 'blocked': 'Blocked',
           'off': 'Off target', 'post': 'Post'}
L, W = m['pitch']['length_m'], m['pitch']['width_m']
def num(v): return ('%.3f' % v).replace('.', ',')
with open(sys.argv[2], 'w', newline='', encoding='utf-8') as f:
    w = csv.writer(f, delimiter=';')
    w.writerow(['Period no', 'Match time', 'Squad', 'Shirt', 'Event', 'Outcome', 'Loc X', 'Loc Y', 'Target X', 'Target Y'])
    for e in d['events']:
        t = e['t']
        clock = '%d:%04.1f' % (t // 60, t % 60)
        team = m['us'] if e['side'] == 'us' else m['opponent']
        # 0-100 both ways, origin top-left, y down, each team attacking left to right.
        x, y = 100 * e['x'] / L, 100 * (1 - e['y'] / W)
        row = [e['period'], clock.replace('.', ','), team, e.get('player', ''), words[e['type']],
               results.get(e.get('result', ''), ''), num(x), num(y)]
        if 'to_x' in e:
            row += [num(100 * e['to_x'] / L), num(100 * (1 - e['to_y'] / W))]
        else:
            row += ['', '']
        w.writerow(row)
