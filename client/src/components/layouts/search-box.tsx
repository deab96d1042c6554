import SearchIcon from '@mui/icons-material/Search';
import InputBase from '@mui/material/InputBase';
import Box from '@mui/material/Box';
import { useState, type FormEvent } from 'react';
import { useNavigate, useSearchParams } from 'react-router';
import { paths } from '../../config/paths.js';

/** Header search: sends the words to the search page, which does the finding. */
export function SearchBox() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const [words, setWords] = useState(params.get('q') ?? '');

  const submit = (event: FormEvent) => {
    event.preventDefault();
    void navigate(paths.search.href(words));
  };

  return (
    <Box
      component="form"
      role="search"
      onSubmit={submit}
      sx={{
        display: 'flex',
        alignItems: 'center',
        gap: 1,
        flex: 1,
        minWidth: 0,
        maxWidth: 520,
        px: 1.5,
        borderRadius: 999,
        bgcolor: 'rgba(255, 255, 255, 0.14)',
        '&:focus-within': { bgcolor: 'rgba(255, 255, 255, 0.22)', outline: '2px solid currentColor' },
      }}
    >
      <SearchIcon aria-hidden />
      <InputBase
        value={words}
        onChange={(event) => setWords(event.target.value)}
        placeholder="Search"
        type="search"
        inputProps={{ 'aria-label': 'Search', enterKeyHint: 'search' }}
        sx={{
          color: 'inherit',
          flex: 1,
          // The input itself is the touch target: 24 px of text plus 20 px of padding.
          '& .MuiInputBase-input': { height: 24, py: 1.25 },
          '& input::placeholder': { opacity: 0.85 },
        }}
      />
    </Box>
  );
}
