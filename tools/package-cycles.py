import sys, subprocess, re, collections
# usage: sccs.py classesdir [classpath]
args=['jdeps','-verbose:class','-filter:none']
if len(sys.argv)>2: args+=['-cp',sys.argv[2]]
args.append(sys.argv[1])
out=subprocess.run(args,capture_output=True,text=True).stdout
pk=collections.defaultdict(set); cls=collections.defaultdict(set)
cur=None
for line in out.splitlines():
    m=re.match(r'^\s+(org\.holdfast\.\S+)\s+->\s+(org\.holdfast\.\S+)',line)
    if not m: continue
    a,b=m.group(1),m.group(2)
    pa=a.rsplit('.',1)[0]; pb=b.rsplit('.',1)[0]
    if pa!=pb:
        pk[pa].add(pb); cls[(pa,pb)].add((a.split('$')[0],b.split('$')[0]))
# tarjan
idx={};low={};st=[];on=set();res=[];c=[0]
sys.setrecursionlimit(10000)
nodes=set(pk)|{b for s in pk.values() for b in s}
def sc(v):
    idx[v]=low[v]=c[0];c[0]+=1;st.append(v);on.add(v)
    for w in pk[v]:
        if w not in idx: sc(w);low[v]=min(low[v],low[w])
        elif w in on: low[v]=min(low[v],idx[w])
    if low[v]==idx[v]:
        comp=[]
        while True:
            w=st.pop();on.discard(w);comp.append(w)
            if w==v:break
        res.append(comp)
for v in sorted(nodes):
    if v not in idx: sc(v)
cyc=[sorted(x) for x in res if len(x)>1]
print("cycles:",len(cyc))
for comp in cyc:
    print("SCC:",' '.join(p.replace('org.holdfast.','') for p in comp))
    s=set(comp)
    for a in comp:
        for b in sorted(pk[a]):
            if b in s:
                print('  %s -> %s : %s'%(a[13:],b[13:],'; '.join(sorted('%s->%s'%(x.rsplit('.',1)[1],y.rsplit('.',1)[1]) for x,y in cls[(a,b)]))))
