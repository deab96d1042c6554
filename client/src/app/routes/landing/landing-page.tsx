import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import Box from '@mui/material/Box';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { SafetyNote } from '../../../components/ui/safety-note.js';
import { paths } from '../../../config/paths.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';

const jobs = [
  {
    title: 'Post and rank meet results',
    text: 'Organisers build the meet, timekeepers post times and scores, and Endgrain ranks, scores and publishes them. Season standings add up across every club and meet.',
  },
  {
    title: 'Link every cut to the head and the wood',
    text: 'Each result and each axe test keeps the head setup (grind, bevel angle, chisel width) and the block (species, diameter, condition), so evidence on what suits which wood grows with every meet.',
  },
  {
    title: 'Learn from Field Notes and First Cuts',
    text: 'Coaches write up findings backed by their trials and results. First Cuts puts the guides a newcomer needs in a sensible order.',
  },
];

export function LandingPage() {
  const { user } = useAuth();
  return (
    <Stack spacing={4} sx={{ py: { xs: 1, sm: 3 } }}>
      <Box>
        <PageHeading lead="Endgrain is where collegiate and club woodsman teams post and rank meet results, keep track of the axes on their rack, and find out which head setup suits which wood.">
          Results, head setups and know-how for woodsman-sports clubs
        </PageHeading>
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
          {user ? (
            <>
              <Button variant="contained" size="large" component={RouterLink} to={paths.results.href()}>
                See results
              </Button>
              <Button variant="outlined" size="large" component={RouterLink} to={paths.fieldNotes.href()}>
                Read Field Notes
              </Button>
            </>
          ) : (
            <>
              <Button variant="contained" size="large" component={RouterLink} to={paths.auth.signUp.href()}>
                Create account
              </Button>
              <Button variant="outlined" size="large" component={RouterLink} to={paths.auth.signIn.href()}>
                Sign in
              </Button>
            </>
          )}
        </Stack>
      </Box>

      <Box
        component="section"
        aria-label="What Endgrain does"
        sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', md: 'repeat(3, 1fr)' } }}
      >
        {jobs.map((job) => (
          <Card key={job.title} variant="outlined">
            <CardContent>
              <Typography variant="h2" sx={{ fontSize: '1.2rem', mb: 1 }}>
                {job.title}
              </Typography>
              <Typography>{job.text}</Typography>
            </CardContent>
          </Card>
        ))}
      </Box>

      <SafetyNote title="Axes and saws hurt people">
        Wear protective footwear, leg protection and eye protection; keep a clear zone around every block; keep edges
        sheathed whenever you are not cutting. Endgrain is no substitute for qualified coaching, and the sanctioning
        body&apos;s rules and local law always come first.
      </SafetyNote>
    </Stack>
  );
}
