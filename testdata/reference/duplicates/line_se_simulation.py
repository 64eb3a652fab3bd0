"""Monte Carlo study behind the choice of HC3 intervals for the Thompson-Howarth line above
duplicates.bootstrapMaxPairs (Cupel, org.cupel.duplicates). Not a reference file read by a test: it records why
LargeSampleAgreementTest checks the HC3 standard errors against the true sampling spread and not against the
pair bootstrap.

For 200 simulated sets (two normal measurements with SD 0.02 + 0.05 c at lognormal grades with log-SD SIG,
3 decimals) it fits the Thompson-Howarth line (groups of 11, median |d| times 1.048358 on group mean) and prints
  true sd       the SD of the (intercept, slope) estimates over the 200 sets
  mean hc3 se   the mean HC3 standard error (numpy, as statsmodels cov_type='HC3') and its SD over sets
  mean boot se  the mean SD of 300 pair-bootstrap replicates (resample pairs, regroup, refit), first 15 sets
Run (numpy 1.24, Debian): /usr/bin/python3 line_se_simulation.py N SIG, e.g. 5500 0.6; the runs made are in
line_se_simulation.txt (5500 0.6, 5500 1.2 and 50000 1.2; the last takes about 15 minutes).
"""
import numpy as np, sys
rng=np.random.default_rng(1)
G=11
Z=1.959964
S=1/(np.sqrt(2)*0.6744897501960817)
def groups(m,d):
    o=np.lexsort((d,m)); g=len(m)//G
    ms=m[o][:g*G].reshape(g,G); ds=d[o][:g*G].reshape(g,G)
    return ms.mean(1), np.median(ds,1), np.sqrt((ds**2).sum(1)/(2*G))
def ols_hc3(x,y):
    X=np.column_stack([np.ones_like(x),x]); XtXi=np.linalg.inv(X.T@X); beta=XtXi@X.T@y
    e=y-X@beta; h=np.einsum('ij,jk,ik->i',X,XtXi,X); w=e**2/(1-h)**2
    V=XtXi@(X.T*w)@X@XtXi
    return beta, np.sqrt(np.diag(V))
def data(n,sig):
    c=np.exp(rng.standard_normal(n)*sig); sd=0.02+0.05*c
    a=np.maximum(0.001,np.round(c+sd*rng.standard_normal(n),3)); b=np.maximum(0.001,np.round(c+sd*rng.standard_normal(n),3))
    return (a+b)/2, np.abs(a-b)
n=int(sys.argv[1]); sig=float(sys.argv[2])
est=[];se=[];bse=[]
for rep in range(200):
    m,d=data(n,sig)
    x,med,rms=groups(m,d)
    beta,s=ols_hc3(x,med*S); est.append(beta); se.append(s)
    if rep<15:
        bs=[]
        for r in range(300):
            i=rng.integers(0,n,n)
            xx,mm,_=groups(m[i],d[i]); bs.append(ols_hc3(xx,mm*S)[0])
        bse.append(np.std(bs,0))
est=np.array(est);se=np.array(se);bse=np.array(bse)
print("n",n,"sig",sig)
print("true sd      ",est.std(0))
print("mean hc3 se  ",se.mean(0), " sd of hc3 se", se.std(0))
print("mean boot se ",bse.mean(0), " sd of boot se", bse.std(0))
