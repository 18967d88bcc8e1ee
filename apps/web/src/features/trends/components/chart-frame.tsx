import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import Box from '@mui/material/Box';
import { useRef, type ReactNode } from 'react';
import { monoFontFamily } from '../../../theme/tokens';
import { savePng, saveSvg } from './chart-export';

interface ChartFrameProps {
  title: string;
  /** File name of the exports, without extension. */
  fileName: string;
  /** What the chart shows, for screen readers. */
  summary: string;
  height?: number;
  children: ReactNode;
}

/** A titled chart with its SVG and PNG exports. */
export function ChartFrame({ title, fileName, summary, height = 300, children }: ChartFrameProps) {
  const ref = useRef<HTMLDivElement>(null);
  return (
    <Box component="figure" sx={{ m: 0 }} aria-label={title}>
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', mb: 1 }}>
        <Typography component="figcaption" variant="h3">
          {title}
        </Typography>
        <Stack direction="row" spacing={1}>
          <Button size="small" variant="outlined" onClick={() => ref.current && saveSvg(ref.current, fileName)}>
            Save SVG
          </Button>
          <Button
            size="small"
            variant="outlined"
            onClick={() => {
              if (ref.current) void savePng(ref.current, fileName);
            }}
          >
            Save PNG
          </Button>
        </Stack>
      </Stack>
      <Box ref={ref} role="img" aria-label={summary} sx={{ height, fontFamily: monoFontFamily, fontSize: 12 }}>
        {children}
      </Box>
    </Box>
  );
}
