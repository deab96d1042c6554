import SearchIcon from '@mui/icons-material/Search';
import InputBase from '@mui/material/InputBase';
import Box from '@mui/material/Box';
import { useEffect, useState, type FormEvent } from 'react';
import { useLocation, useNavigate, useSearchParams } from 'react-router';

import { paths } from '../../config/paths.js';

/** Header search: typing opens the search page, whose results follow the words as they are typed. */
export function SearchBox() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const [words, setWords] = useState(params.get('q') ?? '');
  const onSearchPage = useLocation().pathname === paths.search.path;

  // The search page has its own box; both show the words in the address.
  useEffect(() => {
    if (onSearchPage) setWords(params.get('q') ?? '');
  }, [onSearchPage, params]);

  const change = (next: string) => {
    setWords(next);
    if (onSearchPage) {
      const query = new URLSearchParams(params);
      if (next) query.set('q', next);
      else query.delete('q');
      void navigate({ search: query.toString() }, { replace: true });
    } else if (next.trim()) {
      void navigate(paths.search.href(next));
    }
  };

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
        onChange={(event) => change(event.target.value)}
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
