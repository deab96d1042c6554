import AutoStories from '@mui/icons-material/AutoStories';
import CalendarMonth from '@mui/icons-material/CalendarMonth';
import Carpenter from '@mui/icons-material/Carpenter';
import EmojiEvents from '@mui/icons-material/EmojiEvents';
import GridOn from '@mui/icons-material/GridOn';
import Leaderboard from '@mui/icons-material/Leaderboard';
import MenuBook from '@mui/icons-material/MenuBook';
import Science from '@mui/icons-material/Science';
import type { SvgIconComponent } from '@mui/icons-material';

import type { PlaceKey } from '../../config/places.js';

const icons: Record<PlaceKey, SvgIconComponent> = {
  meets: CalendarMonth,
  results: EmojiEvents,
  standings: Leaderboard,
  rack: Carpenter,
  trials: Science,
  grainMap: GridOn,
  fieldNotes: MenuBook,
  firstCuts: AutoStories,
};

export function PlaceIcon({ place }: { place: PlaceKey }) {
  const Icon = icons[place];
  return <Icon aria-hidden />;
}
